import { S3Client } from '@aws-sdk/client-s3';
import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { EnvironmentVariables } from '../config/env.validation';
import { LocalObjectStore } from './local-object-store';
import { OBJECT_STORE, type ObjectStore } from './object-store';
import { S3ObjectStore } from './s3-object-store';
import { parseStorageUrl } from './storage-url';
import { uploadsFolder } from './uploads-folder';

/**
 * The object store the configuration asks for: S3 when STORAGE_URL is set (credentials and region
 * from the usual AWS variables, read by the SDK itself), else the local folder.
 */
export function createObjectStore(config: ConfigService<EnvironmentVariables, true>): ObjectStore {
  const url = config.get('STORAGE_URL', { infer: true });
  if (!url) return new LocalObjectStore(uploadsFolder(config));
  const endpoint = config.get('STORAGE_ENDPOINT', { infer: true });
  const client = new S3Client({
    region: process.env.AWS_REGION || 'us-east-1',
    ...(endpoint ? { endpoint, forcePathStyle: true } : {}),
    // Checksums only where S3 requires them: compatible servers (and the local fake) do not all
    // accept the SDK's default trailing checksums on a streamed body.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  return new S3ObjectStore(client, parseStorageUrl(url));
}

@Module({
  providers: [{ provide: OBJECT_STORE, inject: [ConfigService], useFactory: createObjectStore }],
  exports: [OBJECT_STORE],
})
export class StorageModule {}
