import type { CreateCalculationBody } from '@loftwright/contract';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsObject,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  MinLength,
} from 'class-validator';
import { KIND_IDS } from '@loftwright/buoyancy';
import { type Visibility, VISIBILITIES } from '../calculation.entity';

export const TAG_PATTERN = /^[\p{L}\p{N}][\p{L}\p{N} ._-]{0,39}$/u;

export class CreateCalculationDto implements CreateCalculationBody {
  @ApiProperty({ example: 'Survey pod envelope, spring campaign' })
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  title: string;

  @ApiProperty({ enum: KIND_IDS })
  @IsIn(KIND_IDS, { message: `kind must be one of: ${KIND_IDS.join(', ')}` })
  kind: string;

  @ApiProperty({
    description:
      "the kind's inputs (see docs/calculation-kinds.md); outputs are computed by the server",
  })
  @IsObject()
  inputs: Record<string, unknown>;

  @ApiPropertyOptional({ enum: VISIBILITIES, default: 'private' })
  @IsOptional()
  @IsIn(VISIBILITIES)
  visibility?: Visibility;

  @ApiPropertyOptional({ type: [String], example: ['spring-campaign'] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @Matches(TAG_PATTERN, {
    each: true,
    message: 'each tag must be 1–40 letters, digits, spaces, dots, dashes or underscores',
  })
  tags?: string[];

  @ApiPropertyOptional({ description: 'change note of version 1' })
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  note?: string;
}
