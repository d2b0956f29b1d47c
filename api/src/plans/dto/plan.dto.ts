import type { PlanLineInput, SavePlanBody } from '@loftwright/contract';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsInt,
  IsISO8601,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';

/** One kind of envelope: a saved calculation version, or a gas volume entered directly. */
export class PlanLineDto implements PlanLineInput {
  @ApiPropertyOptional({ example: 'Survey sondes' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  label?: string;

  @ApiProperty({ example: 6 })
  @IsInt({ message: 'count must be a whole number' })
  @Min(1)
  @Max(100000)
  count: number;

  @ApiPropertyOptional({ description: 'calculation whose version gives the envelope volume' })
  @IsOptional()
  @IsUUID('4', { message: 'calculationId must be a calculation id (a UUID)' })
  calculationId?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsInt()
  @Min(1)
  versionNumber?: number;

  @ApiPropertyOptional({
    description:
      'diameter of a spherical envelope [m], for a line with neither calculation nor volume',
  })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0.01, { message: 'diameterM must be at least 0.01 m' })
  @Max(500, { message: 'diameterM must be at most 500 m' })
  diameterM?: number;

  @ApiPropertyOptional({
    description: 'gas per envelope at fill conditions [m³], when no calculation is named',
  })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  volumeM3?: number;
}

export class PlanFillDto {
  @ApiProperty({ example: 288.15 })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  temperatureK: number;

  @ApiProperty({ example: 101325 })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  pressurePa: number;
}

// The parts the engine checks arrive as plain objects; the rest is held to the contract.
export class SavePlanDto implements Omit<
  SavePlanBody,
  'electrolyser' | 'measured' | 'cylinder' | 'prices'
> {
  @ApiProperty({ example: 'Spring launch weekend' })
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  title: string;

  @ApiPropertyOptional({ example: '2027-04-17' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'eventDate must be a date (ISO 8601)' })
  eventDate?: string;

  @ApiProperty({ type: [PlanLineDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'lines needs at least one envelope' })
  @ArrayMaxSize(200)
  @ValidateNested({ each: true })
  @Type(() => PlanLineDto)
  lines: PlanLineDto[];

  @ApiProperty({ type: PlanFillDto })
  @ValidateNested()
  @Type(() => PlanFillDto)
  fill: PlanFillDto;

  @ApiPropertyOptional({
    description: 'as the gas-supply kind takes it (docs/calculation-kinds.md)',
  })
  @IsOptional()
  @IsObject()
  electrolyser?: Record<string, unknown>;

  @ApiPropertyOptional({
    description: 'metered energy and volume, as the gas-supply kind takes it',
  })
  @IsOptional()
  @IsObject()
  measured?: Record<string, unknown>;

  @ApiPropertyOptional({ description: 'as the gas-supply kind takes it' })
  @IsOptional()
  @IsObject()
  cylinder?: Record<string, unknown>;

  @ApiPropertyOptional({ description: 'currency and prices, as the gas-supply kind takes them' })
  @IsOptional()
  @IsObject()
  prices?: Record<string, unknown>;

  @ApiPropertyOptional({ example: '2026-11-30', description: 'when the prices were quoted' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'pricesDate must be a date (ISO 8601)' })
  pricesDate?: string;
}
