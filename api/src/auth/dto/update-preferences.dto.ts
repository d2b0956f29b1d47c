import type { Preferences } from '@loftwright/contract';
import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  type NumberFormat,
  NUMBER_FORMATS,
  type UnitSystem,
  UNIT_SYSTEMS,
} from '../../users/preferences';
import { IsCurrencyCode, IsNumberFormat, IsSent, IsUnitSystem } from './preference.validators';

/** Any of the account's preferences; at least one must be sent (UsersService.setPreferences). */
export class UpdatePreferencesDto implements Partial<Preferences> {
  @ApiPropertyOptional({ enum: [...UNIT_SYSTEMS] })
  @IsSent()
  @IsUnitSystem()
  unitSystem?: UnitSystem;

  @ApiPropertyOptional({
    enum: [...NUMBER_FORMATS],
    description:
      'how numbers are written: point-comma 1,234.5; comma-space 1 234,5; comma-point 1.234,5',
  })
  @IsSent()
  @IsNumberFormat()
  numberFormat?: NumberFormat;

  @ApiPropertyOptional({
    example: 'EUR',
    pattern: '^[A-Z]{3}$',
    description: 'ISO 4217 code, upper case: the default currency of new gas plans and prices',
  })
  @IsSent()
  @IsCurrencyCode()
  currency?: string;
}
