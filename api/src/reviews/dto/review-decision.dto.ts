import type {
  ApproveVersionBody,
  SendBackVersionBody,
  SubmitVersionBody,
} from '@loftwright/contract';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, IsUUID, MaxLength, MinLength, ValidateBy } from 'class-validator';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class SubmitVersionDto implements SubmitVersionBody {
  @ApiPropertyOptional({
    description: 'the reviewer asked for; leave out to let any reviewer take it',
  })
  @IsOptional()
  @IsUUID()
  reviewerId?: string;
}

/** Whether the runtime knows an IANA time zone name ("Europe/Berlin"). */
const isTimeZone = (value: unknown) => {
  if (typeof value !== 'string' || value.length > 64) return false;
  try {
    new Intl.DateTimeFormat('en', { timeZone: value });
    return true;
  } catch {
    return false;
  }
};

export class ApproveVersionDto implements ApproveVersionBody {
  @ApiPropertyOptional({ example: 'Checked against the fill log of the test envelope.' })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @MaxLength(4000)
  comment?: string;

  @ApiPropertyOptional({
    example: 'Europe/Berlin',
    description:
      'the approver’s time zone (IANA): the archived sheet gives the time in it and in UTC',
  })
  @IsOptional()
  @ValidateBy({
    name: 'isTimeZone',
    validator: {
      validate: isTimeZone,
      defaultMessage: () => 'timeZone must be a time zone name such as Europe/Berlin',
    },
  })
  timeZone?: string;
}

export class SendBackVersionDto implements SendBackVersionBody {
  @ApiProperty({ example: 'Use the measured film mass, not the catalogue value.' })
  @Transform(trim)
  @IsString()
  @MinLength(1, { message: 'comment is required when sending a version back' })
  @MaxLength(4000)
  comment: string;
}
