import { link, open, rm, stat } from 'node:fs/promises';
import { resolve, sep } from 'node:path';
import type { Readable } from 'node:stream';
import { makePrivateDirectory } from '../config/data-dir';
import { checkedSha256, type ObjectStore, StoredObjectMissing } from './object-store';

const isCode = (error: unknown, code: string): boolean =>
  (error as NodeJS.ErrnoException | null)?.code === code;

/**
 * Objects as files in a folder (DATA_DIR/uploads), named by hash in two-character fan-out
 * folders that keep directories small.
 */
export class LocalObjectStore implements ObjectStore {
  constructor(readonly root: string) {}

  pathFor(sha256: string): string {
    const path = resolve(this.root, checkedSha256(sha256).slice(0, 2), sha256);
    // Belt and braces: the checked hash cannot leave the folder, and this says so.
    if (!path.startsWith(this.root + sep)) throw new Error('Upload path escapes its folder');
    return path;
  }

  /**
   * A hard link from the synced file to its hashed name: atomic, and it fails when the name is
   * taken, which is "write only if absent" without a window between check and write. The file
   * must be on the same file system (staging happens inside the same folder).
   */
  async put(sha256: string, file: { readonly path: string }): Promise<void> {
    const target = this.pathFor(sha256);
    makePrivateDirectory(resolve(this.root, sha256.slice(0, 2)));
    try {
      await link(file.path, target);
    } catch (error) {
      if (!isCode(error, 'EEXIST')) throw error;
    }
  }

  async get(sha256: string): Promise<Readable> {
    const path = this.pathFor(sha256);
    try {
      // Opened now, so a missing file is known before anything is sent.
      const handle = await open(path, 'r');
      return handle.createReadStream();
    } catch (error) {
      if (isCode(error, 'ENOENT')) throw new StoredObjectMissing(sha256);
      throw error;
    }
  }

  async exists(sha256: string): Promise<boolean> {
    try {
      return (await stat(this.pathFor(sha256))).isFile();
    } catch (error) {
      if (isCode(error, 'ENOENT')) return false;
      throw error;
    }
  }

  async delete(sha256: string): Promise<void> {
    await rm(this.pathFor(sha256), { force: true });
  }
}
