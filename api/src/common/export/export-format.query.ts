import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { EXPORT_FORMATS, type ExportFormat } from './table-export';

/** `?format=csv|xlsx` of a table export; CSV when left out. */
export class ExportFormatQuery {
  @ApiPropertyOptional({ enum: EXPORT_FORMATS, default: 'csv' })
  @IsOptional()
  @IsIn(EXPORT_FORMATS, { message: `format must be one of: ${EXPORT_FORMATS.join(', ')}` })
  format?: ExportFormat;
}
