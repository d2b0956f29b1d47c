import type { Readable } from 'node:stream';

/** Nest token of the configured object store (a string, so tests can look it up by name). */
export const OBJECT_STORE = 'OBJECT_STORE';

const SHA256_HEX = /^[0-9a-f]{64}$/;

/**
 * Where stored files live, each under the SHA-256 of its bytes: the local folder by default,
 * an S3 bucket when STORAGE_URL says so. Writes go by content hash and never replace an object
 * already there, so the same bytes are kept once however often they are uploaded.
 */
export interface ObjectStore {
  /** Stores a local, synced file under its hash unless an object is there already. */
  put(sha256: string, file: { readonly path: string; readonly sizeBytes: number }): Promise<void>;
  /** The object's bytes as a stream; rejects with StoredObjectMissing when there is none. */
  get(sha256: string): Promise<Readable>;
  exists(sha256: string): Promise<boolean>;
  /** Removes the object; removing one that is not there is not an error. */
  delete(sha256: string): Promise<void>;
}

/** No object under that hash. */
export class StoredObjectMissing extends Error {
  constructor(readonly sha256: string) {
    super(`No stored object ${sha256}`);
    this.name = 'StoredObjectMissing';
  }
}

/**
 * The hash, checked: every path and key is built from a 64-digit lowercase hex digest only, so no
 * name from a client can reach the file system or another key.
 */
export function checkedSha256(sha256: string): string {
  if (!SHA256_HEX.test(sha256)) throw new Error(`Not a SHA-256 hex digest: ${sha256}`);
  return sha256;
}
