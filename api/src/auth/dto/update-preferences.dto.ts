import { ApiProperty } from '@nestjs/swagger';
import { IsIn } from 'class-validator';

export class UpdatePreferencesDto {
  @ApiProperty({ enum: ['si', 'us'] })
  @IsIn(['si', 'us'])
  unitSystem: 'si' | 'us';
}
