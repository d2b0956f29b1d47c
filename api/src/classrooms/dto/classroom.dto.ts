import type { CreateClassBody, JoinClassBody, RenewJoinCodeBody } from '@loftwright/contract';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsOptional, IsString, Max, MaxLength, Min, MinLength } from 'class-validator';

export class CreateClassroomDto implements CreateClassBody {
  @ApiProperty({ example: 'Physics 11B: buoyancy week' })
  @IsString()
  @MinLength(1, { message: 'title must not be empty' })
  @MaxLength(200)
  title: string;

  @ApiPropertyOptional({ description: 'days the join code admits students (default 14)' })
  @IsOptional()
  @IsInt({ message: 'joinCodeValidDays must be a whole number of days' })
  @Min(1, { message: 'joinCodeValidDays must be at least 1' })
  @Max(365, { message: 'joinCodeValidDays must be at most 365' })
  joinCodeValidDays?: number;
}

export class RenewJoinCodeDto implements RenewJoinCodeBody {
  @ApiPropertyOptional({ description: 'days the new code admits students (default 14)' })
  @IsOptional()
  @IsInt({ message: 'joinCodeValidDays must be a whole number of days' })
  @Min(1, { message: 'joinCodeValidDays must be at least 1' })
  @Max(365, { message: 'joinCodeValidDays must be at most 365' })
  joinCodeValidDays?: number;
}

export class JoinClassroomDto implements JoinClassBody {
  @ApiProperty({ example: 'K7QM-3XPA', description: 'the code the teacher handed out' })
  @IsString({ message: 'code must be text' })
  @MinLength(1, { message: 'code must not be empty' })
  @MaxLength(40, { message: 'code is too long to be a join code' })
  code: string;
}
