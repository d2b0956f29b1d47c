import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  IsArray,
  IsIn,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  MinLength,
} from 'class-validator';
import { type Visibility, VISIBILITIES } from '../calculation.entity';
import { TAG_PATTERN } from './create-calculation.dto';

/** Details of a calculation that are not part of any version. */
export class UpdateCalculationDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  title?: string;

  @ApiPropertyOptional({ enum: VISIBILITIES })
  @IsOptional()
  @IsIn(VISIBILITIES)
  visibility?: Visibility;

  @ApiPropertyOptional({ type: [String] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(20)
  @Matches(TAG_PATTERN, {
    each: true,
    message: 'each tag must be 1–40 letters, digits, spaces, dots, dashes or underscores',
  })
  tags?: string[];
}
