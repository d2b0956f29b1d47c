import { Module } from '@nestjs/common';
import { StorageModule } from '../storage/storage.module';
import { UploadStore } from './upload-store';

/**
 * The upload store on its own, so the upload middleware (configured while the attachments
 * module is built) can stream into the same store the service commits from.
 */
@Module({ imports: [StorageModule], providers: [UploadStore], exports: [UploadStore] })
export class AttachmentStoreModule {}
