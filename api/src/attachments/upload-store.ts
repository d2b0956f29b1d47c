import { createHash, randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream, type ReadStream } from 'node:fs';
import { open, rm } from 'node:fs/promises';
import { type Readable, Transform } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { join } from 'node:path';
import { Inject, Injectable, Logger, ServiceUnavailableException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { makePrivateDirectory } from '../config/data-dir';
import type { EnvironmentVariables } from '../config/env.validation';
import { OBJECT_STORE, type ObjectStore, StoredObjectMissing } from '../storage/object-store';
import { uploadsFolder } from '../storage/uploads-folder';

/** Bytes written and synced to a temporary file, not yet visible under their hash. */
export interface StagedUpload {
  readonly sha256: string;
  readonly temporaryPath: string;
  readonly sizeBytes: number;
}

/** An upload streamed to disk: its hash, size and first bytes (enough to tell its type). */
export interface StagedStream extends StagedUpload {
  readonly head: Buffer;
}

/** Bytes at the start of a file that type detection (file-type) looks at. */
export const HEAD_BYTES = 4100;

/**
 * Uploads on their way in and out. Every upload is first staged in DATA_DIR/uploads (streamed to
 * a temporary file, hashed on the way, synced); `commit` then puts it in the object store (that
 * same folder, or S3) under the SHA-256 of its bytes. Stored files are only ever named by a
 * checked hash, so no name from a client reaches the file system or a bucket key.
 */
@Injectable()
export class UploadStore {
  /** Folder of staged files (and of stored ones when no bucket is set). */
  readonly root: string;
  private readonly logger = new Logger('UploadStore');

  constructor(
    config: ConfigService<EnvironmentVariables, true>,
    @Inject(OBJECT_STORE) private readonly objects: ObjectStore,
  ) {
    this.root = uploadsFolder(config);
  }

  /**
   * Writes the bytes to a temporary file, synced, and returns their hash. Nothing is visible under
   * the hash until `commit`: the caller commits and records the reference in one step under the
   * write lock, so a removal of the same content can never fall between the two.
   */
  async stage(bytes: Buffer): Promise<StagedUpload> {
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    makePrivateDirectory(this.root);
    const temporaryPath = join(this.root, `.incoming-${randomUUID()}`);
    const handle = await open(temporaryPath, 'wx', 0o600);
    try {
      await handle.writeFile(bytes);
      await handle.sync();
    } catch (error) {
      await handle.close();
      await rm(temporaryPath, { force: true });
      throw error;
    }
    await handle.close();
    return { sha256, temporaryPath, sizeBytes: bytes.length };
  }

  /**
   * Streams an upload to a temporary file (owner-only, synced), hashing it on the way, so no
   * upload is ever held in memory whole. Nothing is visible under the hash until `commit`.
   */
  async stageStream(source: Readable): Promise<StagedStream> {
    makePrivateDirectory(this.root);
    const temporaryPath = join(this.root, `.incoming-${randomUUID()}`);
    const hash = createHash('sha256');
    const headChunks: Buffer[] = [];
    let headLength = 0;
    let sizeBytes = 0;
    try {
      await pipeline(
        source,
        new Transform({
          transform(chunk: Buffer, _encoding, callback) {
            hash.update(chunk);
            sizeBytes += chunk.length;
            if (headLength < HEAD_BYTES) {
              headChunks.push(chunk.subarray(0, HEAD_BYTES - headLength));
              headLength += Math.min(chunk.length, HEAD_BYTES - headLength);
            }
            callback(null, chunk);
          },
        }),
        createWriteStream(temporaryPath, { flags: 'wx', mode: 0o600 }),
      );
      // On disk before anything refers to it.
      const handle = await open(temporaryPath, 'r+');
      try {
        await handle.sync();
      } finally {
        await handle.close();
      }
    } catch (error) {
      await rm(temporaryPath, { force: true });
      throw error;
    }
    return {
      sha256: hash.digest('hex'),
      temporaryPath,
      sizeBytes,
      head: Buffer.concat(headChunks),
    };
  }

  /** Reads a staged file in chunks, for checks that need more than its head. */
  readStaged(staged: StagedUpload): ReadStream {
    return createReadStream(staged.temporaryPath);
  }

  /**
   * Stores a staged file under its hash unless the store has it already (same hash, same bytes).
   * The staged file stays until `discard`, so a commit can be repeated.
   */
  async commit(staged: StagedUpload): Promise<void> {
    await this.reach(() =>
      this.objects.put(staged.sha256, {
        path: staged.temporaryPath,
        sizeBytes: staged.sizeBytes,
      }),
    );
  }

  /** Drops a staged file that will not be committed. */
  async discard(staged: StagedUpload): Promise<void> {
    await rm(staged.temporaryPath, { force: true });
  }

  /** The stored bytes as a stream; rejects with StoredObjectMissing when they are gone. */
  read(sha256: string): Promise<Readable> {
    return this.reach(() => this.objects.get(sha256));
  }

  exists(sha256: string): Promise<boolean> {
    return this.reach(() => this.objects.exists(sha256));
  }

  /**
   * Removes stored bytes whose last record is already gone. If the store cannot be reached the
   * bytes stay behind, unreferenced, as after a crash; the removal the user asked for is done.
   */
  async remove(sha256: string): Promise<void> {
    try {
      await this.objects.delete(sha256);
    } catch (error) {
      this.logger.warn(`Could not delete stored object ${sha256}: ${String(error)}`);
    }
  }

  /**
   * A store that cannot be reached (S3 down, refused, misconfigured) answers 503, not 500: the
   * request was fine and may succeed later. A missing object is passed on as such.
   */
  private async reach<T>(action: () => Promise<T>): Promise<T> {
    try {
      return await action();
    } catch (error) {
      if (error instanceof StoredObjectMissing) throw error;
      this.logger.error(`The file store failed: ${String(error)}`);
      throw new ServiceUnavailableException({
        message: 'The file store cannot be reached just now; nothing was changed. Try again later.',
      });
    }
  }
}
