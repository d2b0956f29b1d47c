import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { MulterModule } from '@nestjs/platform-express';
import { TypeOrmModule } from '@nestjs/typeorm';
import { memoryStorage } from 'multer';
import { CalculationsModule } from '../calculations/calculations.module';
import type { EnvironmentVariables } from '../config/env.validation';
import { FillLog } from '../fill-logs/fill-log.entity';
import { UsersModule } from '../users/users.module';
import { Attachment } from './attachment.entity';
import { AttachmentsController } from './attachments.controller';
import { AttachmentsService } from './attachments.service';
import { UploadLimitFilter } from './upload-limit.filter';
import { UploadStore } from './upload-store';

@Module({
  imports: [
    TypeOrmModule.forFeature([Attachment, FillLog]),
    CalculationsModule,
    UsersModule,
    // Uploads are held in memory while their content is checked and hashed; the size limit
    // keeps that bounded.
    MulterModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<EnvironmentVariables, true>) => ({
        storage: memoryStorage(),
        limits: { fileSize: config.get('UPLOAD_MAX_BYTES', { infer: true }), files: 1, fields: 10 },
      }),
    }),
  ],
  controllers: [AttachmentsController],
  providers: [AttachmentsService, UploadStore, UploadLimitFilter],
  exports: [AttachmentsService],
})
export class AttachmentsModule {}
