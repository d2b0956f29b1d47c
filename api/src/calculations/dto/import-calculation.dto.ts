import { ApiProperty } from '@nestjs/swagger';
import { KIND_IDS } from '@loftwright/buoyancy';
import { Type } from 'class-transformer';
import {
  Allow,
  ArrayMaxSize,
  ArrayMinSize,
  Equals,
  IsArray,
  IsIn,
  IsInt,
  IsObject,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';
import { CALCULATION_FILE_FORMAT, CALCULATION_FILE_VERSION } from '../calculation-file';
import { TAG_PATTERN } from './create-calculation.dto';

class ImportedCalculationDto {
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  title: string;

  @IsIn(KIND_IDS, { message: `calculation.kind must be one of: ${KIND_IDS.join(', ')}` })
  kind: string;

  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @Matches(TAG_PATTERN, {
    each: true,
    message: 'each tag must be 1–40 letters, digits, spaces, dots, dashes or underscores',
  })
  tags?: string[];
}

class ImportedVersionDto {
  @IsInt()
  @Min(1)
  number: number;

  @IsObject({ message: 'inputs must be an object' })
  inputs: Record<string, unknown>;

  @IsOptional()
  @IsString()
  @MaxLength(2000)
  note?: string;

  // Written by an export for people to read; an import recomputes them and ignores these.
  @Allow() author?: unknown;
  @Allow() createdAt?: unknown;
  @Allow() status?: unknown;
  @Allow() engineVersion?: unknown;
  @Allow() fingerprint?: unknown;
  @Allow() outputs?: unknown;
}

/**
 * Versions one imported file may hold. Each is recomputed by the engine (a flight profile takes
 * milliseconds to tens of them); more than this is not a calculation's history but a load.
 */
export const MAX_IMPORTED_VERSIONS = 100;

/** A Loftwright calculation file, as GET /api/calculations/:id/export writes it. */
export class ImportCalculationDto {
  @ApiProperty({ example: CALCULATION_FILE_FORMAT })
  @Equals(CALCULATION_FILE_FORMAT, {
    message: `format must be "${CALCULATION_FILE_FORMAT}": this is not a Loftwright calculation file`,
  })
  format: string;

  @ApiProperty({ example: CALCULATION_FILE_VERSION })
  @Equals(CALCULATION_FILE_VERSION, {
    message: `formatVersion must be ${CALCULATION_FILE_VERSION}; this Loftwright reads version ${CALCULATION_FILE_VERSION} files`,
  })
  formatVersion: number;

  @Allow() exportedAt?: unknown;
  @Allow() engineVersion?: unknown;

  @ApiProperty()
  @ValidateNested()
  @Type(() => ImportedCalculationDto)
  calculation: ImportedCalculationDto;

  @ApiProperty()
  @IsArray()
  @ArrayMinSize(1, { message: 'versions needs at least one version' })
  @ArrayMaxSize(MAX_IMPORTED_VERSIONS, {
    message: `versions may hold at most ${MAX_IMPORTED_VERSIONS} versions in one file`,
  })
  @ValidateNested({ each: true })
  @Type(() => ImportedVersionDto)
  versions: ImportedVersionDto[];
}
