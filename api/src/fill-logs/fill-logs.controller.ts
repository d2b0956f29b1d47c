import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Patch,
  Post,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { intParam } from '../common/pipes/int-param.pipe';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { AddReadingsDto, CreateFillLogDto, UpdateFillLogDto } from './dto/fill-log.dto';
import { FillLogsService } from './fill-logs.service';

@ApiTags('fill logs')
@ApiBearerAuth()
@Controller()
export class FillLogsController {
  constructor(private readonly fillLogs: FillLogsService) {}

  @Post('calculations/:id/versions/:n/fill-logs')
  create(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Body() body: CreateFillLogDto,
  ) {
    return this.fillLogs.create(user, id, n, body);
  }

  @Get('calculations/:id/fill-logs')
  list(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string) {
    return this.fillLogs.list(user, id);
  }

  @Get('fill-logs/:id')
  get(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string) {
    return this.fillLogs.get(user, id);
  }

  @Patch('fill-logs/:id')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: UpdateFillLogDto,
  ) {
    return this.fillLogs.update(user, id, body);
  }

  @Post('fill-logs/:id/readings')
  addReadings(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: AddReadingsDto,
  ) {
    return this.fillLogs.addReadings(user, id, body);
  }

  @Delete('fill-logs/:id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string) {
    return this.fillLogs.remove(user, id);
  }
}
