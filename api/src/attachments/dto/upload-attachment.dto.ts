import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsUUID } from 'class-validator';

/** Form fields sent beside the file. */
export class UploadAttachmentDto {
  @ApiPropertyOptional({ description: 'fill log of the calculation the file belongs to' })
  @IsOptional()
  @IsUUID('4', { message: 'fillLogId must be a fill log id (a UUID)' })
  fillLogId?: string;
}
