import type { UpdateRolesBody } from '@loftwright/contract';
import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsIn } from 'class-validator';
import { type Role, ROLES } from '../roles';

export class UpdateRolesDto implements UpdateRolesBody {
  @ApiProperty({ enum: ROLES, isArray: true, example: ['designer', 'reviewer'] })
  @IsArray()
  @ArrayMaxSize(ROLES.length)
  @IsIn(ROLES, { each: true })
  roles: Role[];
}
