import type { Account } from '@loftwright/contract';
import { Body, Controller, Get, HttpCode, HttpStatus, Patch, Post, Res } from '@nestjs/common';
import type { Response } from 'express';
import {
  ApiAcceptedResponse,
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { RateLimited } from '../common/rate-limit';
import { toPublicUser } from '../users/user.entity';
import { UsersService } from '../users/users.service';
import { AuthService, type RegisterOutcome, type SignedIn } from './auth.service';
import type { AuthUser } from './auth-user';
import { LoginDto } from './dto/login.dto';
import { PasswordResetConfirmDto, PasswordResetRequestDto } from './dto/password-reset.dto';
import { ConfirmRegistrationDto, RegisterDto } from './dto/register.dto';
import { UpdatePreferencesDto } from './dto/update-preferences.dto';
import { NotFoundException } from '@nestjs/common';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly authService: AuthService,
    private readonly usersService: UsersService,
  ) {}

  @Public()
  @RateLimited('register')
  @Post('register')
  @ApiCreatedResponse({
    description: 'the first account of an empty database, created and signed in (status signed-in)',
  })
  @ApiAcceptedResponse({
    description:
      'any later registration (status check-mail): the same answer whether or not the address ' +
      'has an account; a new address is mailed a link that creates it, a taken one its owner',
  })
  async register(
    @Body() body: RegisterDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<RegisterOutcome> {
    const outcome = await this.authService.register(body);
    response.status(outcome.status === 'signed-in' ? HttpStatus.CREATED : HttpStatus.ACCEPTED);
    return outcome;
  }

  @Public()
  @RateLimited('sign-in')
  @Post('register/confirm')
  @ApiCreatedResponse({ description: 'the account is created and signed in' })
  @ApiBadRequestResponse({ description: 'the link is not valid or has expired (field token)' })
  confirmRegistration(@Body() body: ConfirmRegistrationDto): Promise<SignedIn> {
    return this.authService.confirmRegistration(body.token);
  }

  @Public()
  @RateLimited('sign-in')
  @Post('login')
  @HttpCode(HttpStatus.OK)
  login(@Body() body: LoginDto): Promise<SignedIn> {
    return this.authService.login(body);
  }

  @ApiBearerAuth()
  @Post('logout')
  @HttpCode(HttpStatus.NO_CONTENT)
  logout(@CurrentUser() user: AuthUser): Promise<void> {
    return this.authService.logout(user.id);
  }

  @ApiBearerAuth()
  @Get('me')
  async me(@CurrentUser() user: AuthUser): Promise<Account> {
    const found = await this.usersService.findById(user.id);
    if (!found) throw new NotFoundException({ message: 'No such user.' });
    return toPublicUser(found);
  }

  @ApiBearerAuth()
  @Patch('me/preferences')
  // Declaring one response drops the default 200 from the document, so it is declared too.
  @ApiOkResponse({ description: 'the account, with the preferences as now stored' })
  @ApiBadRequestResponse({
    description: 'no preference sent, or a value not allowed; the body names the field',
  })
  async updatePreferences(
    @CurrentUser() user: AuthUser,
    @Body() body: UpdatePreferencesDto,
  ): Promise<Account> {
    await this.usersService.setPreferences(user.id, body);
    return this.me(user);
  }

  @Public()
  @RateLimited('sign-in')
  @Post('password-reset/request')
  @HttpCode(HttpStatus.ACCEPTED)
  async requestReset(@Body() body: PasswordResetRequestDto): Promise<{ message: string }> {
    await this.authService.requestPasswordReset(body.email);
    return { message: 'If this address has an account, a reset link is on its way.' };
  }

  @Public()
  @RateLimited('sign-in')
  @Post('password-reset/confirm')
  @HttpCode(HttpStatus.NO_CONTENT)
  confirmReset(@Body() body: PasswordResetConfirmDto): Promise<void> {
    return this.authService.confirmPasswordReset(body.token, body.password);
  }
}
