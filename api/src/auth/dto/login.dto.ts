import type { SignInBody } from '@loftwright/contract';
import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';

export class LoginDto implements SignInBody {
  @ApiProperty({ example: 'designer@demo.test' })
  @IsString()
  @MinLength(3)
  @MaxLength(254)
  email: string;

  @ApiProperty()
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  password: string;
}
