import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';

export class ContentQueryDto {
  @ApiPropertyOptional({ enum: ['1'], description: 'send as a download rather than inline' })
  @IsOptional()
  @IsIn(['1', 'true'], { message: 'download must be 1 when given' })
  download?: string;
}
