import { PartialType, PickType } from '@nestjs/swagger';
import { CreateCalculationDto } from './create-calculation.dto';

/** Details of a calculation that are not part of any version; each is optional. */
export class UpdateCalculationDto extends PartialType(
  PickType(CreateCalculationDto, ['title', 'visibility', 'tags'] as const),
) {}
