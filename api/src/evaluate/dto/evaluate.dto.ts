import type { EvaluateBody } from '@loftwright/contract';
import { ApiProperty } from '@nestjs/swagger';
import { IsIn, IsObject } from 'class-validator';
import { KIND_IDS } from '@loftwright/buoyancy';

export class EvaluateDto implements EvaluateBody {
  @ApiProperty({ enum: KIND_IDS })
  @IsIn(KIND_IDS, { message: `kind must be one of: ${KIND_IDS.join(', ')}` })
  kind: string;

  @ApiProperty({ description: "the kind's inputs (docs/calculation-kinds.md)" })
  @IsObject()
  inputs: Record<string, unknown>;
}
