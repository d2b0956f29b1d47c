import { createHash, randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream, existsSync, type ReadStream } from 'node:fs';
import { open, rename, rm } from 'node:fs/promises';
import { type Readable, Transform } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { join, resolve, sep } from 'node:path';
import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { makePrivateDirectory, preparePrivateDataDir } from '../config/data-dir';
import type { EnvironmentVariables } from '../config/env.validation';

const SHA256_HEX = /^[0-9a-f]{64}$/;

/** Bytes written and synced to a temporary file, not yet visible under their hash. */
export interface StagedUpload {
  readonly sha256: string;
  readonly temporaryPath: string;
}

/** An upload streamed to disk: its hash, size and first bytes (enough to tell its type). */
export interface StagedStream extends StagedUpload {
  readonly sizeBytes: number;
  readonly head: Buffer;
}

/** Bytes at the start of a file that type detection (file-type) looks at. */
export const HEAD_BYTES = 4100;

/**
 * Files under DATA_DIR/uploads, each named by the SHA-256 of its bytes (two-character fan-out
 * folders keep directories small). A path is only ever built from a checked hash, so no name
 * from a client can reach the file system.
 */
@Injectable()
export class UploadStore {
  readonly root: string;

  constructor(config: ConfigService<EnvironmentVariables, true>) {
    this.root = resolve(preparePrivateDataDir(config.get('DATA_DIR', { infer: true })), 'uploads');
  }

  pathFor(sha256: string): string {
    if (!SHA256_HEX.test(sha256)) throw new Error(`Not a SHA-256 hex digest: ${sha256}`);
    const path = resolve(this.root, sha256.slice(0, 2), sha256);
    // Belt and braces: the checked hash cannot leave the folder, and this says so.
    if (!path.startsWith(this.root + sep)) throw new Error('Upload path escapes its folder');
    return path;
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
    return { sha256, temporaryPath };
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

  /** Puts a staged file under its hash; a file already there has the same bytes and is replaced. */
  async commit(staged: StagedUpload): Promise<void> {
    makePrivateDirectory(join(this.root, staged.sha256.slice(0, 2)));
    await rename(staged.temporaryPath, this.pathFor(staged.sha256));
  }

  /** Drops a staged file that will not be committed. */
  async discard(staged: StagedUpload): Promise<void> {
    await rm(staged.temporaryPath, { force: true });
  }

  read(sha256: string): ReadStream {
    return createReadStream(this.pathFor(sha256));
  }

  exists(sha256: string): boolean {
    return existsSync(this.pathFor(sha256));
  }

  async remove(sha256: string): Promise<void> {
    await rm(this.pathFor(sha256), { force: true });
  }
}
