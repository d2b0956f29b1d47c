import type { PasswordResetConfirmBody, PasswordResetRequestBody } from '@loftwright/contract';
import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, Length, MaxLength, MinLength } from 'class-validator';
import { IsBcryptSafe } from './password.validator';

export class PasswordResetRequestDto implements PasswordResetRequestBody {
  @ApiProperty({ example: 'designer@demo.test' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;
}

export class PasswordResetConfirmDto implements PasswordResetConfirmBody {
  @ApiProperty({ description: 'the token from the reset link' })
  @IsString()
  @Length(20, 200)
  token: string;

  @ApiProperty({ minLength: 10 })
  @IsString()
  @MinLength(10, { message: 'password must have at least 10 characters' })
  @IsBcryptSafe()
  password: string;
}
