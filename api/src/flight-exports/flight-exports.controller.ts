import {
  FLIGHT_EXPORT_FILES,
  type FlightExportFile,
  type VersionLandingArea,
} from '@loftwright/contract';
import { Controller, Get, NotFoundException, Param, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { intParam } from '../common/pipes/int-param.pipe';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { FlightExportsService } from './flight-exports.service';

function isExportFile(file: string): file is FlightExportFile {
  return (FLIGHT_EXPORT_FILES as readonly string[]).includes(file);
}

@ApiTags('calculations')
@ApiBearerAuth()
@Controller('calculations')
export class FlightExportsController {
  constructor(private readonly flightExports: FlightExportsService) {}

  /** The flight's track (GeoJSON, KML, GPX) or profile (CSV), as a download. */
  @Get(':id/versions/:n/exports/:file')
  async download(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
    @Param('file') file: string,
    @Res() response: Response,
  ): Promise<void> {
    if (!isExportFile(file)) {
      throw new NotFoundException({
        message: `No such file: downloads are ${FLIGHT_EXPORT_FILES.join(', ')}.`,
        field: 'file',
      });
    }
    const download = await this.flightExports.download(user, id, n, file);
    response.setHeader('Content-Disposition', download.disposition);
    response.setHeader('X-Content-Type-Options', 'nosniff');
    response.type(`${download.contentType}; charset=utf-8`).send(download.body);
  }

  @Get(':id/versions/:n/landing-area')
  landingArea(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Param('n', intParam('n')) n: number,
  ): Promise<VersionLandingArea> {
    return this.flightExports.landingArea(user, id, n);
  }
}
