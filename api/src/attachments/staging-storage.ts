import type { Request } from 'express';
import type { StorageEngine } from 'multer';
import type { StagedStream, UploadStore } from './upload-store';

/** What the upload route receives in place of multer's in-memory file: the file as staged. */
export interface StagedFile {
  readonly originalname: string;
  readonly size: number;
  readonly staged: StagedStream;
}

/**
 * A multer storage engine that streams each upload straight to a temporary file in the upload
 * store (hashing it on the way), so a large upload never sits in memory; multer's size limit
 * still cuts it off, and the partial file is removed.
 */
export function stagingStorage(store: UploadStore): StorageEngine {
  return {
    _handleFile(_request: Request, file, callback) {
      store.stageStream(file.stream).then(
        (staged) =>
          callback(null, { size: staged.sizeBytes, staged } as Partial<Express.Multer.File>),
        (error: unknown) => callback(error as Error),
      );
    },
    _removeFile(_request: Request, file, callback) {
      const staged = (file as unknown as { staged?: StagedStream }).staged;
      if (!staged) return callback(null);
      store.discard(staged).then(
        () => callback(null),
        (error: unknown) => callback(error as Error),
      );
    },
  };
}
