import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';
import { IsBcryptSafe } from './password.validator';

export class RegisterDto {
  @ApiProperty({ example: 'wren@example.org' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ minLength: 10, description: 'at least 10 characters, at most 72 bytes' })
  @IsString()
  @MinLength(10, { message: 'password must have at least 10 characters' })
  @IsBcryptSafe()
  password: string;

  @ApiProperty({ example: 'Wren Halloway' })
  @IsString()
  @MinLength(1)
  @MaxLength(80)
  displayName: string;
}
