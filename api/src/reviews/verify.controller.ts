import type { Verification } from '@loftwright/contract';
import { Controller, Get, Param } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user';
import { OptionalUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { FingerprintPipe } from '../common/pipes/fingerprint.pipe';
import { VerifyService } from './verify.service';

@ApiTags('verify')
@Controller('verify')
export class VerifyController {
  constructor(private readonly verifyService: VerifyService) {}

  /** Open to anyone holding a fingerprint, for example from a printed sign-off sheet. */
  @Public()
  @Get(':fingerprint')
  verify(
    @Param('fingerprint', FingerprintPipe) fingerprint: string,
    @OptionalUser() user: AuthUser | undefined,
  ): Promise<Verification> {
    return this.verifyService.verify(fingerprint, user);
  }
}
