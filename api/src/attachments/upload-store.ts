import { createHash, randomUUID } from 'node:crypto';
import { createReadStream, existsSync, type ReadStream } from 'node:fs';
import { mkdir, open, rename, rm } from 'node:fs/promises';
import { join, resolve, sep } from 'node:path';
import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { EnvironmentVariables } from '../config/env.validation';

const SHA256_HEX = /^[0-9a-f]{64}$/;

/**
 * Files under DATA_DIR/uploads, each named by the SHA-256 of its bytes (two-character fan-out
 * folders keep directories small). A path is only ever built from a checked hash, so no name
 * from a client can reach the file system.
 */
@Injectable()
export class UploadStore {
  readonly root: string;

  constructor(config: ConfigService<EnvironmentVariables, true>) {
    this.root = resolve(config.get('DATA_DIR', { infer: true }), 'uploads');
  }

  pathFor(sha256: string): string {
    if (!SHA256_HEX.test(sha256)) throw new Error(`Not a SHA-256 hex digest: ${sha256}`);
    const path = resolve(this.root, sha256.slice(0, 2), sha256);
    // Belt and braces: the checked hash cannot leave the folder, and this says so.
    if (!path.startsWith(this.root + sep)) throw new Error('Upload path escapes its folder');
    return path;
  }

  /** Stores the bytes (once per content) and returns their hash; written, synced, then renamed. */
  async put(bytes: Buffer): Promise<string> {
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    const target = this.pathFor(sha256);
    if (existsSync(target)) return sha256;
    await mkdir(join(this.root, sha256.slice(0, 2)), { recursive: true });
    const temporary = join(this.root, `.incoming-${randomUUID()}`);
    const handle = await open(temporary, 'wx', 0o600);
    try {
      await handle.writeFile(bytes);
      await handle.sync();
    } finally {
      await handle.close();
    }
    await rename(temporary, target);
    return sha256;
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
