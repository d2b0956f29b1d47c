import type { ContinueCalculationBody } from '@loftwright/contract';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { KIND_IDS } from '@loftwright/buoyancy';

export class ContinueCalculationDto implements ContinueCalculationBody {
  @ApiProperty({ enum: KIND_IDS, example: 'flight-profile' })
  @IsIn(KIND_IDS, { message: `toKind must be one of: ${KIND_IDS.join(', ')}` })
  toKind: string;
}
