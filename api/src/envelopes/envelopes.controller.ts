import type { Envelope, EnvelopeDetail } from '@loftwright/contract';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Put,
} from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { EnvelopeDto, UpdateEnvelopeDto } from './dto/envelope.dto';
import { EnvelopesService } from './envelopes.service';

@ApiTags('envelopes')
@ApiBearerAuth()
@Controller('envelopes')
export class EnvelopesController {
  constructor(private readonly envelopes: EnvelopesService) {}

  @Get()
  list(@CurrentUser() user: AuthUser): Promise<Envelope[]> {
    return this.envelopes.list(user);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() body: EnvelopeDto): Promise<EnvelopeDetail> {
    return this.envelopes.create(user, body);
  }

  @Get(':id')
  get(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<EnvelopeDetail> {
    return this.envelopes.get(user, id);
  }

  @Put(':id')
  @ApiConflictResponse({ description: 'changed since the version the edit started from' })
  replace(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: UpdateEnvelopeDto,
  ): Promise<EnvelopeDetail> {
    return this.envelopes.update(user, id, body);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiConflictResponse({ description: 'fill logs name the envelope' })
  remove(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string): Promise<void> {
    return this.envelopes.remove(user, id);
  }
}
