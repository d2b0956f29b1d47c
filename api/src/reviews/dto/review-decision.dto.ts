import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, IsUUID, MaxLength, MinLength } from 'class-validator';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class SubmitVersionDto {
  @ApiPropertyOptional({
    description: 'the reviewer asked for; leave out to let any reviewer take it',
  })
  @IsOptional()
  @IsUUID()
  reviewerId?: string;
}

export class ApproveVersionDto {
  @ApiPropertyOptional({ example: 'Checked against the fill log of the test envelope.' })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MaxLength(4000)
  comment?: string;
}

export class SendBackVersionDto {
  @ApiProperty({ example: 'Use the measured film mass, not the catalogue value.' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'comment is required when sending a version back' })
  @MaxLength(4000)
  comment: string;
}
