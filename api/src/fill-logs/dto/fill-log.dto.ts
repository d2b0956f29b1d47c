import type { AddReadingsBody, FillLogBody } from '@loftwright/contract';
import { GAS_SOURCES, type GasSource } from '@loftwright/contract';
import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { Nullable } from '../../common/pipes/request-shape';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsISO8601,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  MaxLength,
  ValidateNested,
} from 'class-validator';

export class FillAmbientDto {
  @ApiProperty({ description: 'air temperature at the fill [K]', example: 287.2 })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  temperatureK: number;

  @ApiProperty({ description: 'absolute air pressure [Pa]', example: 100900 })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  pressurePa: number;

  @ApiPropertyOptional({ description: 'relative humidity, 0 to 1', example: 0.72 })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  relativeHumidity?: number;
}

/** What the scale and the ballast can tell apart; the engine checks the ranges. */
export class FillInstrumentDto {
  @ApiProperty({
    description: 'smallest step the scale (or spring, or load cell) shows [kg]',
    example: 0.001,
  })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  scaleResolutionKg: number;

  @ApiProperty({
    description: 'how far the ballast may be off its stated mass [kg]',
    example: 0.0005,
  })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  ballastToleranceKg: number;
}

// The parts the engine checks arrive as plain objects; the rest is held to the contract.
export class CreateFillLogDto implements Omit<FillLogBody, 'ambient' | 'readings' | 'instrument'> {
  @ApiProperty({ example: '2026-11-28T09:40:00Z' })
  @IsISO8601({ strict: true }, { message: 'filledAt must be a date and time (ISO 8601)' })
  filledAt: string;

  @ApiPropertyOptional({ example: 'Saltmarsh dyke, north hut' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  place?: string;

  @ApiPropertyOptional({ example: 'Envelope 3 (orange)' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  envelopeLabel?: string;

  @ApiPropertyOptional({ description: 'a library envelope (GET /api/envelopes); null unlinks' })
  @IsOptional()
  @Nullable()
  @IsUUID('4', { message: 'Envelope must be an envelope of the library (its id)' })
  envelopeId?: string | null;

  @ApiProperty({ enum: GAS_SOURCES })
  @IsIn(GAS_SOURCES, { message: `gasSource must be one of: ${GAS_SOURCES.join(', ')}` })
  gasSource: GasSource;

  @ApiProperty({ type: FillAmbientDto })
  @ValidateNested()
  @Type(() => FillAmbientDto)
  ambient: FillAmbientDto;

  @ApiProperty({
    description:
      'lift readings: { kind: "ballast", timeS, ballastMassKg, scaleReadingKg } or { kind: "direct", timeS, netLiftKg }, each with optional airTemperatureK and pressurePa',
  })
  @IsArray()
  @ArrayMinSize(1, { message: 'readings needs at least one reading' })
  @ArrayMaxSize(1000)
  @IsObject({ each: true, message: 'each reading must be an object' })
  readings: Record<string, unknown>[];

  @ApiPropertyOptional({
    type: FillInstrumentDto,
    description: 'the instruments; the engine’s stated defaults when absent',
  })
  @IsOptional()
  @ValidateNested()
  @Type(() => FillInstrumentDto)
  instrument?: FillInstrumentDto;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  note?: string;
}

export class UpdateFillLogDto extends PartialType(CreateFillLogDto) {}

/**
 * Readings from an import, checked all together and stored in one write, or not at all. The
 * readings arrive as plain objects for the engine to check; the rest is held to the contract.
 */
export class AddReadingsDto implements Omit<AddReadingsBody, 'readings'> {
  @ApiProperty({ enum: ['append', 'replace'] })
  @IsIn(['append', 'replace'])
  mode: 'append' | 'replace';

  @ApiProperty()
  @IsArray()
  @ArrayMinSize(1, { message: 'readings needs at least one reading' })
  @ArrayMaxSize(1000)
  @IsObject({ each: true, message: 'each reading must be an object' })
  readings: Record<string, unknown>[];
}
