import {
  type ArgumentsHost,
  Catch,
  type ExceptionFilter,
  Injectable,
  PayloadTooLargeException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Response } from 'express';
import type { EnvironmentVariables } from '../config/env.validation';

/** Says how big an upload may be, and which setting changes it, instead of "File too large". */
@Catch(PayloadTooLargeException)
@Injectable()
export class UploadLimitFilter implements ExceptionFilter {
  private readonly maxBytes: number;

  constructor(config: ConfigService<EnvironmentVariables, true>) {
    this.maxBytes = config.get('UPLOAD_MAX_BYTES', { infer: true });
  }

  catch(_exception: PayloadTooLargeException, host: ArgumentsHost): void {
    const size =
      this.maxBytes >= 1024 * 1024
        ? `${Number((this.maxBytes / (1024 * 1024)).toFixed(1))} MB`
        : `${Number((this.maxBytes / 1024).toFixed(1))} kB`;
    host
      .switchToHttp()
      .getResponse<Response>()
      .status(413)
      .json({
        statusCode: 413,
        error: 'Payload Too Large',
        message: `file is larger than the ${size} an upload may be (UPLOAD_MAX_BYTES).`,
        field: 'file',
        limitBytes: this.maxBytes,
      });
  }
}
