import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, MaxLength } from 'class-validator';

/**
 * The card's typed values as query text. They are read as numbers by the service, so a missing or
 * unreadable one is answered 422 naming it with the engine's range, like every other input.
 */
export class FillCardQueryDto {
  @ApiPropertyOptional({ description: 'mass of the filler [kg]; required' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  fillerMassKg?: string;

  @ApiPropertyOptional({ description: "target free lift [kg]; the version's own when left out" })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  freeLiftKg?: string;

  @ApiPropertyOptional({ description: 'internal (water) volume of one cylinder [m³]' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  cylinderWaterVolumeM3?: string;

  @ApiPropertyOptional({ description: 'gauge pressure of a full cylinder [Pa]' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  cylinderFillPressurePa?: string;

  @ApiPropertyOptional({ description: 'cylinder temperature [K]' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  cylinderTemperatureK?: string;

  @ApiPropertyOptional({ description: 'full cylinders the team has (default 1)' })
  @IsOptional()
  @IsString()
  @MaxLength(40)
  cylinderCount?: string;
}
