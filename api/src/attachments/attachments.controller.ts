import type { Attachment } from '@loftwright/contract';
import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  Post,
  Query,
  Res,
  UploadedFile,
  UseFilters,
  UseGuards,
  UseInterceptors,
} from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { pipeline } from 'node:stream';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { uuidParam } from '../common/pipes/uuid-param.pipe';
import { AttachmentsService } from './attachments.service';
import { ContentQueryDto } from './dto/content-query.dto';
import { UploadAttachmentDto } from './dto/upload-attachment.dto';
import { contentDisposition } from './file-name';
import type { StagedFile } from './staging-storage';
import { UploadAccessGuard } from './upload-access.guard';
import { UploadLimitFilter } from './upload-limit.filter';

/**
 * Served files may be text a browser would otherwise guess is HTML: never sniff, never run
 * anything, never let a page frame it.
 */
const SAFE_HEADERS = {
  'X-Content-Type-Options': 'nosniff',
  'Content-Security-Policy':
    "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox",
  'Cross-Origin-Resource-Policy': 'same-origin',
  'Cache-Control': 'private, no-cache',
};

@ApiTags('attachments')
@ApiBearerAuth()
@Controller()
export class AttachmentsController {
  constructor(private readonly attachments: AttachmentsService) {}

  @Post('calculations/:id/attachments')
  @UseFilters(UploadLimitFilter)
  // Access first, before the interceptor reads the body.
  @UseGuards(UploadAccessGuard)
  @UseInterceptors(FileInterceptor('file'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: {
        file: { type: 'string', format: 'binary' },
        fillLogId: { type: 'string', format: 'uuid' },
      },
    },
  })
  upload(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @UploadedFile() file: StagedFile | undefined,
    @Body() body: UploadAttachmentDto,
  ): Promise<Attachment> {
    return this.attachments.upload(user, id, file, body.fillLogId ?? null);
  }

  @Get('calculations/:id/attachments')
  list(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
  ): Promise<Attachment[]> {
    return this.attachments.list(user, id);
  }

  @Get('attachments/:id/content')
  async content(
    @CurrentUser() user: AuthUser,
    @Param('id', uuidParam('id')) id: string,
    @Query() query: ContentQueryDto,
    @Res() response: Response,
  ): Promise<void> {
    const { attachment, stream } = await this.attachments.content(user, id);
    const text = attachment.mediaType.startsWith('text/');
    response.set({
      ...SAFE_HEADERS,
      'Content-Type': text ? `${attachment.mediaType}; charset=utf-8` : attachment.mediaType,
      'Content-Length': String(attachment.sizeBytes),
      'Content-Disposition': contentDisposition(
        query.download ? 'attachment' : 'inline',
        attachment.fileName,
      ),
      ETag: `"${attachment.sha256}"`,
    });
    // Streamed as it arrives (from disk or S3); an error or a client going away mid-file ends
    // both sides, so the response is cut short rather than left hanging.
    pipeline(stream, response, () => undefined);
  }

  @Delete('attachments/:id')
  @HttpCode(HttpStatus.NO_CONTENT)
  remove(@CurrentUser() user: AuthUser, @Param('id', uuidParam('id')) id: string): Promise<void> {
    return this.attachments.remove(user, id);
  }
}
