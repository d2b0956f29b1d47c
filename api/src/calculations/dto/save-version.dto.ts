import type { SaveVersionBody } from '@loftwright/contract';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsInt, IsObject, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';

export class SaveVersionDto implements SaveVersionBody {
  @ApiProperty({ description: 'the version number this edit started from', example: 1 })
  @IsInt()
  @Min(1)
  @Max(1_000_000)
  baseVersion: number;

  @ApiProperty()
  @IsObject()
  inputs: Record<string, unknown>;

  @ApiPropertyOptional({ example: 'Heavier camera bracket' })
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  note?: string;

  @ApiPropertyOptional({
    description: 'a continued calculation: the source version its inputs were re-taken from',
    example: 2,
  })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(1_000_000)
  sourceVersion?: number;
}
