import type { CalculationListQuery } from '@loftwright/contract';
import { ApiPropertyOptional, IntersectionType } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { ExportFormatQuery } from '../../common/export/export-format.query';
import { KIND_IDS } from '@loftwright/buoyancy';
import { PageQueryDto } from '../../common/dto/page-query.dto';
import { VERSION_STATUSES } from '../calculation-version.entity';

export const SORT_FIELDS = ['updatedAt', 'createdAt', 'title', 'kind', 'status'] as const;
export const SORTS = SORT_FIELDS.flatMap((field) => [field, `-${field}`]);

export class ListCalculationsDto extends PageQueryDto implements CalculationListQuery {
  @ApiPropertyOptional({
    enum: SORTS,
    default: '-updatedAt',
    description: 'a leading "-" sorts descending',
  })
  @IsOptional()
  @IsIn(SORTS)
  sort = '-updatedAt';

  @ApiPropertyOptional({ enum: KIND_IDS })
  @IsOptional()
  @IsIn(KIND_IDS)
  kind?: string;

  @ApiPropertyOptional({ enum: VERSION_STATUSES, description: 'status of the newest version' })
  @IsOptional()
  @IsIn(VERSION_STATUSES)
  status?: string;

  @ApiPropertyOptional({ description: 'a user id, or "me"' })
  @IsOptional()
  @IsString()
  @MaxLength(36)
  owner?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(40)
  tag?: string;

  @ApiPropertyOptional({ description: 'words to find in the title or tags' })
  @IsOptional()
  @IsString()
  @MaxLength(100)
  q?: string;
}

/** The list's filters and order, and the file format. */
export class ExportCalculationsDto extends IntersectionType(
  ListCalculationsDto,
  ExportFormatQuery,
) {}
