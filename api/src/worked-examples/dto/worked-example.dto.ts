import type {
  ExampleSettings,
  ExerciseSettings,
  PublishExampleBody,
  SubmitAnswersBody,
} from '@loftwright/contract';
import { Nullable } from '../../common/pipes/request-shape';
import { REVEAL_RULES, type RevealRule } from '../worked-example.entity';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
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

export class ExerciseSettingsDto implements ExerciseSettings {
  @ApiProperty({ example: ['grossLift'], description: 'outputs the students must work out' })
  @IsArray()
  @ArrayMinSize(1, { message: 'exercise.hiddenOutputs needs at least one output' })
  @ArrayMaxSize(20)
  @IsString({ each: true })
  hiddenOutputs: string[];

  @ApiProperty({ example: 2, description: 'how far an answer may be from the engine’s value [%]' })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0.1, { message: 'exercise.tolerancePercent must be at least 0.1 %' })
  @Max(50, { message: 'exercise.tolerancePercent must be at most 50 %' })
  tolerancePercent: number;

  @ApiPropertyOptional({
    enum: REVEAL_RULES,
    default: 'after-correct',
    description:
      'when a student who has answered sees the engine’s values: after a right answer, after a right answer or revealAfterAttempts attempts, or only when the class closes',
  })
  @IsOptional()
  @IsIn(REVEAL_RULES, { message: `exercise.reveal must be one of: ${REVEAL_RULES.join(', ')}` })
  reveal?: RevealRule;

  @ApiPropertyOptional({ example: 3, description: 'attempts that reveal the values (1–20)' })
  @IsOptional()
  @IsInt({ message: 'exercise.revealAfterAttempts must be a whole number' })
  @Min(1, { message: 'exercise.revealAfterAttempts must be at least 1' })
  @Max(20, { message: 'exercise.revealAfterAttempts must be at most 20' })
  revealAfterAttempts?: number;
}

/** What a teacher may set around a published example; the calculation content stays fixed. */
export class ExampleSettingsDto implements ExampleSettings {
  @ApiPropertyOptional({ example: 'How much does a litre of helium lift?' })
  @IsOptional()
  @IsString()
  @MinLength(1, { message: 'title must not be empty' })
  @MaxLength(200)
  title?: string;

  @ApiPropertyOptional({ description: 'a short introduction, with the outside source named' })
  @IsOptional()
  @IsString()
  @MaxLength(4000, { message: 'intro must be at most 4000 characters' })
  intro?: string;

  @ApiPropertyOptional({ description: 'a note on each step, by step id', example: {} })
  @IsOptional()
  @IsObject({ message: 'stepNotes must be an object of step id to note' })
  stepNotes?: Record<string, string>;

  @ApiPropertyOptional({
    description: 'inputs students may change, by dotted path, with min and max in SI units',
    example: { 'envelope.diameterM': { min: 0.5, max: 2 } },
  })
  @IsOptional()
  @IsObject({ message: 'tryRanges must be an object of input path to { min, max }' })
  tryRanges?: Record<string, { min: number; max: number }>;

  @ApiPropertyOptional({ description: 'step id at which the walk-through shows the chart' })
  @IsOptional()
  @Nullable()
  @IsString()
  chartStepId?: string | null;

  @ApiPropertyOptional({ type: ExerciseSettingsDto, nullable: true })
  @IsOptional()
  @Nullable()
  @IsObject({ message: 'exercise must be an object of settings, or null for no exercise' })
  @ValidateNested()
  @Type(() => ExerciseSettingsDto)
  exercise?: ExerciseSettingsDto | null;
}

export class PublishExampleDto extends ExampleSettingsDto implements PublishExampleBody {
  @ApiProperty()
  @IsUUID('4', { message: 'calculationId must be a calculation id (a UUID)' })
  calculationId: string;

  @ApiProperty({ example: 1 })
  @IsInt({ message: 'versionNumber must be a whole number' })
  @Min(1, { message: 'versionNumber must be at least 1' })
  versionNumber: number;
}

export class SubmitAnswersDto implements SubmitAnswersBody {
  @ApiProperty({
    example: { grossLift: 1.114 },
    description: 'an answer per hidden output, in the unit the output is given in',
  })
  @IsObject({ message: 'answers must be an object of output name to number' })
  answers: Record<string, number | null>;
}
