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
  Query,
  Res,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ExportFormatQuery } from '../common/export/export-format.query';
import { sendTable } from '../common/export/table-export';
import { intParam } from '../common/pipes/int-param.pipe';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { AddReadingsDto, CreateFillLogDto, UpdateFillLogDto } from './dto/fill-log.dto';
import type { FillLogView } from './fill-log-views';
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
  ): Promise<FillLogView> {
    return this.fillLogs.create(user, id, n, body);
  }

  @Get('calculations/:id/fill-logs')
  list(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<FillLogView[]> {
    return this.fillLogs.list(user, id);
  }

  /** The calculation's fill logs as a CSV or XLSX table, one row per fill. */
  @Get('calculations/:id/fill-logs/export')
  async export(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Query() query: ExportFormatQuery,
    @Res() response: Response,
  ): Promise<void> {
    const logs = await this.fillLogs.list(user, id);
    const output = (log: FillLogView, name: string) =>
      (log.outputs as Record<string, { value: number } | undefined>)[name]?.value ?? null;
    const air = (log: FillLogView) =>
      log.ambient as { temperatureK: number; pressurePa: number; relativeHumidity?: number };
    await sendTable<FillLogView>(
      response,
      query.format ?? 'csv',
      'loftwright-fill-logs',
      [
        { header: 'Filled at (UTC)', value: (log) => new Date(log.filledAt), width: 22 },
        { header: 'Place', value: (log) => log.place, width: 24 },
        { header: 'Envelope', value: (log) => log.envelopeLabel, width: 20 },
        { header: 'Gas source', value: (log) => log.gasSource },
        { header: 'Version', value: (log) => log.versionNumber, width: 9 },
        {
          header: 'Air temperature (°C)',
          value: (log) => Number((air(log).temperatureK - 273.15).toFixed(3)),
        },
        { header: 'Air pressure (hPa)', value: (log) => air(log).pressurePa / 100 },
        {
          header: 'Relative humidity (%)',
          value: (log) =>
            air(log).relativeHumidity === undefined ? null : (air(log).relativeHumidity ?? 0) * 100,
        },
        { header: 'Readings', value: (log) => log.readings.length, width: 10 },
        { header: 'Measured net lift (kg)', value: (log) => output(log, 'measuredNetLift') },
        { header: 'Predicted net lift (kg)', value: (log) => output(log, 'predictedNetLift') },
        { header: 'Measured less predicted (kg)', value: (log) => output(log, 'difference') },
        { header: 'Difference (%)', value: (log) => output(log, 'differencePercent') },
        { header: 'Explaining purity (%)', value: (log) => output(log, 'explainingPurity') },
        { header: 'Half-life of lift (days)', value: (log) => output(log, 'halfLife') },
        { header: 'Loss rate (%/day)', value: (log) => output(log, 'lossRate') },
        { header: 'Note', value: (log) => log.note, width: 40 },
        { header: 'Logged by', value: (log) => log.createdBy?.displayName ?? '' },
      ],
      logs,
    );
  }

  @Get('fill-logs/:id')
  get(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<FillLogView> {
    return this.fillLogs.get(user, id);
  }

  @Patch('fill-logs/:id')
  update(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: UpdateFillLogDto,
  ): Promise<FillLogView> {
    return this.fillLogs.update(user, id, body);
  }

  @Post('fill-logs/:id/readings')
  addReadings(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Body() body: AddReadingsDto,
  ): Promise<FillLogView> {
    return this.fillLogs.addReadings(user, id, body);
  }

  @Delete('fill-logs/:id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string): Promise<void> {
    return this.fillLogs.remove(user, id);
  }
}
