import type { AuditQuery } from '@loftwright/contract';
import { ApiPropertyOptional, IntersectionType } from '@nestjs/swagger';
import { IsISO8601, IsOptional, IsString, IsUUID, MaxLength } from 'class-validator';
import { ExportFormatQuery } from '../../common/export/export-format.query';
import { PageQueryDto } from '../../common/dto/page-query.dto';

export class ListAuditDto extends PageQueryDto implements AuditQuery {
  @ApiPropertyOptional({ example: 'version.approve' })
  @IsOptional()
  @IsString()
  @MaxLength(64)
  action?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsUUID()
  actorId?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(64)
  targetId?: string;

  @ApiPropertyOptional({ description: 'ISO 8601 time, inclusive' })
  @IsOptional()
  @IsISO8601()
  from?: string;

  @ApiPropertyOptional({ description: 'ISO 8601 time, inclusive' })
  @IsOptional()
  @IsISO8601()
  to?: string;
}

/** The list's filters and order, and the file format. */
export class ExportAuditDto extends IntersectionType(ListAuditDto, ExportFormatQuery) {}
