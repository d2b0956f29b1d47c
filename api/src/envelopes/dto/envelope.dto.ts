import {
  type EnvelopeBody,
  type LibraryEnvelopeKind,
  type UpdateEnvelopeBody,
} from '@loftwright/contract';
import { LIBRARY_ENVELOPE_KINDS, LIBRARY_ENVELOPE_RANGES } from '@loftwright/buoyancy';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  Max,
  MaxLength,
  Min,
  MinLength,
} from 'class-validator';

const FINITE = { allowNaN: false, allowInfinity: false } as const;
const { massKg, burstDiameterM, dragCoefficient, ratedSuperpressurePa } = LIBRARY_ENVELOPE_RANGES;

// Messages name each field by the label the form shows, with its unit: the web puts them beside it.
export class EnvelopeDto implements EnvelopeBody {
  @ApiProperty({ example: 'Practice sphere 300 g' })
  @IsString({ message: 'Name must be text' })
  @MinLength(1, { message: 'Name is needed' })
  @MaxLength(120, { message: 'Name must be at most 120 characters' })
  name: string;

  @ApiProperty({ enum: LIBRARY_ENVELOPE_KINDS })
  @IsIn(LIBRARY_ENVELOPE_KINDS, { message: 'Kind must be extensible or fixed' })
  kind: LibraryEnvelopeKind;

  @ApiProperty({ description: 'mass of the empty envelope [kg]', example: 0.3 })
  @IsNumber(FINITE, { message: 'Mass must be a number (kg)' })
  @Min(massKg.min, { message: `Mass must be at least ${massKg.min} kg` })
  @Max(massKg.max, { message: `Mass must be at most ${massKg.max} kg` })
  massKg: number;

  @ApiPropertyOptional({ description: 'extensible envelopes: burst diameter [m]', example: 4 })
  @IsOptional()
  @IsNumber(FINITE, { message: 'Burst diameter must be a number (m)' })
  @Min(burstDiameterM.min, {
    message: `Burst diameter must be at least ${burstDiameterM.min} m`,
  })
  @Max(burstDiameterM.max, { message: `Burst diameter must be at most ${burstDiameterM.max} m` })
  burstDiameterM?: number;

  @ApiPropertyOptional({ description: 'fixed envelopes: rated superpressure [Pa]', example: 1500 })
  @IsOptional()
  @IsNumber(FINITE, { message: 'Rated superpressure must be a number (Pa)' })
  @Min(ratedSuperpressurePa.min, {
    message: `Rated superpressure must be at least ${ratedSuperpressurePa.min} Pa`,
  })
  @Max(ratedSuperpressurePa.max, {
    message: `Rated superpressure must be at most ${ratedSuperpressurePa.max} Pa`,
  })
  ratedSuperpressurePa?: number;

  @ApiPropertyOptional({ description: 'drag coefficient on the frontal area', example: 0.35 })
  @IsOptional()
  @IsNumber(FINITE, { message: 'Drag coefficient must be a number' })
  @Min(dragCoefficient.min, {
    message: `Drag coefficient must be at least ${dragCoefficient.min}`,
  })
  @Max(dragCoefficient.max, { message: `Drag coefficient must be at most ${dragCoefficient.max}` })
  dragCoefficient?: number;

  @ApiPropertyOptional({ example: 'natural latex' })
  @IsOptional()
  @IsString({ message: 'Film must be text' })
  @MaxLength(120, { message: 'Film must be at most 120 characters' })
  film?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'Notes must be text' })
  @MaxLength(4000, { message: 'Notes must be at most 4000 characters' })
  notes?: string;
}

export class UpdateEnvelopeDto extends EnvelopeDto implements UpdateEnvelopeBody {
  @ApiProperty({ description: 'the version the edit started from', example: 1 })
  @IsInt({ message: 'version must be the whole number the edit started from' })
  @Min(1, { message: 'version must be at least 1' })
  version: number;
}
