import type { ConfirmRegistrationBody, RegisterBody } from '@loftwright/contract';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsEmail, IsOptional, IsString, Length, MaxLength, MinLength } from 'class-validator';
import { type NumberFormat, NUMBER_FORMATS } from '../../users/preferences';
import { IsBcryptSafe } from './password.validator';
import { IsNumberFormat, IsSent } from './preference.validators';

export class RegisterDto implements RegisterBody {
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

  @ApiPropertyOptional({
    example: 'K7QM-3XPA',
    description: 'a class join code: the account is a student account, on that class’s roster',
  })
  @IsOptional()
  @IsString({ message: 'joinCode must be text' })
  @MaxLength(40, { message: 'joinCode is too long to be a join code' })
  joinCode?: string;

  @ApiPropertyOptional({
    enum: [...NUMBER_FORMATS],
    description:
      'how the person writes numbers, as their browser guessed it; point-comma when not sent',
  })
  @IsSent()
  @IsNumberFormat()
  numberFormat?: NumberFormat;
}

export class ConfirmRegistrationDto implements ConfirmRegistrationBody {
  @ApiProperty({ description: 'the token from the link mailed at registration' })
  @IsString({ message: 'token must be text' })
  @Length(20, 200, { message: 'token is not a registration token' })
  token: string;
}
