import type { AddReviewCommentBody, MarkAddressedBody } from '@loftwright/contract';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  Matches,
  MaxLength,
  Min,
  MinLength,
  ValidateNested,
} from 'class-validator';

export class CommentAnchorDto {
  @ApiProperty({ enum: ['input', 'result'] })
  @IsIn(['input', 'result'], { message: 'anchor.kind must be input or result' })
  kind: 'input' | 'result';

  @ApiProperty({
    example: 'envelope.diameterM',
    description: 'an input’s dotted path, or a result’s name',
  })
  @IsString({ message: 'anchor.path must be text' })
  @Matches(/^[A-Za-z0-9_.]{1,200}$/, { message: 'anchor.path must be a dotted field path' })
  path: string;
}

export class AddReviewCommentDto implements AddReviewCommentBody {
  @ApiProperty({ example: 'The film was weighed at 52 g/m², not 45.' })
  @IsString({ message: 'body must be text' })
  @MinLength(1, { message: 'body must not be empty' })
  @MaxLength(4000, { message: 'body must be at most 4000 characters' })
  body: string;

  @ApiPropertyOptional({ type: CommentAnchorDto, description: 'left out: about the whole version' })
  @IsOptional()
  @ValidateNested()
  @Type(() => CommentAnchorDto)
  anchor?: CommentAnchorDto;
}

export class MarkAddressedDto implements MarkAddressedBody {
  @ApiProperty({ example: 4, description: 'the later version that addresses the comment' })
  @Type(() => Number)
  @IsInt({ message: 'versionNumber must be a whole number' })
  @Min(1, { message: 'versionNumber must be at least 1' })
  versionNumber: number;
}
