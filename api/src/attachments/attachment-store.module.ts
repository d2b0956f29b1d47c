import { Module } from '@nestjs/common';
import { UploadStore } from './upload-store';

/**
 * The upload store on its own, so the upload middleware (configured while the attachments
 * module is built) can stream into the same store the service commits from.
 */
@Module({ providers: [UploadStore], exports: [UploadStore] })
export class AttachmentStoreModule {}
