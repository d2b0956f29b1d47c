import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { MulterModule } from '@nestjs/platform-express';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CalculationsModule } from '../calculations/calculations.module';
import type { EnvironmentVariables } from '../config/env.validation';
import { FillLog } from '../fill-logs/fill-log.entity';
import { UsersModule } from '../users/users.module';
import { Attachment } from './attachment.entity';
import { AttachmentsController } from './attachments.controller';
import { AttachmentsService } from './attachments.service';
import { UploadLimitFilter } from './upload-limit.filter';
import { AttachmentStoreModule } from './attachment-store.module';
import { stagingStorage } from './staging-storage';
import { UploadAccessGuard } from './upload-access.guard';
import { UploadStore } from './upload-store';

@Module({
  imports: [
    TypeOrmModule.forFeature([Attachment, FillLog]),
    AttachmentStoreModule,
    CalculationsModule,
    UsersModule,
    // Uploads stream to a temporary file in the store, hashed on the way; memory holds only a
    // chunk at a time, and the size limit cuts off a file that is too big.
    MulterModule.registerAsync({
      imports: [AttachmentStoreModule],
      inject: [ConfigService, UploadStore],
      useFactory: (config: ConfigService<EnvironmentVariables, true>, store: UploadStore) => ({
        storage: stagingStorage(store),
        limits: { fileSize: config.get('UPLOAD_MAX_BYTES', { infer: true }), files: 1, fields: 10 },
      }),
    }),
  ],
  controllers: [AttachmentsController],
  providers: [AttachmentsService, UploadLimitFilter, UploadAccessGuard],
  exports: [AttachmentsService],
})
export class AttachmentsModule {}
