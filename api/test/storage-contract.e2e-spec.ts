import { createHash, randomBytes } from 'node:crypto';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Readable } from 'node:stream';
import { ConfigService } from '@nestjs/config';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { EnvironmentVariables } from '../src/config/env.validation';
import { type ObjectStore, StoredObjectMissing } from '../src/storage/object-store';
import { createObjectStore } from '../src/storage/storage.module';
import { STORAGES, type StoredObjects } from './support/storages';

const sha = (bytes: Buffer): string => createHash('sha256').update(bytes).digest('hex');

/** Reads a stream to its end, counting the chunks it came in. */
async function drain(stream: Readable): Promise<{ bytes: Buffer; chunks: number }> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return { bytes: Buffer.concat(chunks), chunks: chunks.length };
}

describe.each(STORAGES)('object store contract: $name', (storage) => {
  const dataDir = mkdtempSync(join(tmpdir(), 'loftwright-store-'));
  const uploads = join(dataDir, 'uploads');
  let store: ObjectStore;
  let objects: StoredObjects;
  let fileCount = 0;

  /** A synced local file, as an upload is staged before it is put. */
  const staged = (bytes: Buffer) => {
    mkdirSync(uploads, { recursive: true });
    const path = join(uploads, `.incoming-test-${(fileCount += 1)}`);
    writeFileSync(path, bytes);
    return { path, sizeBytes: bytes.length };
  };

  beforeAll(async () => {
    const env = await storage.start();
    // The SDK reads credentials and region from the process, as it does in production.
    for (const [key, value] of Object.entries(env)) process.env[key] = value;
    store = createObjectStore(
      new ConfigService<EnvironmentVariables, true>({ DATA_DIR: dataDir, ...env }),
    );
    objects = storage.objects(dataDir);
  });

  afterAll(async () => {
    (store as { onModuleDestroy?: () => void }).onModuleDestroy?.();
    await storage.stop();
    delete process.env.STORAGE_URL;
    delete process.env.STORAGE_ENDPOINT;
    delete process.env.AWS_ACCESS_KEY_ID;
    delete process.env.AWS_SECRET_ACCESS_KEY;
    delete process.env.AWS_REGION;
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('keeps one object for the same hash put twice, and never replaces it', async () => {
    const first = Buffer.from('time_s,scale_kg\n0,0.210\n');
    const hash = sha(first);
    await store.put(hash, staged(first));
    // Content addressing: whatever is already under a hash stays, even if offered other bytes.
    await store.put(hash, staged(Buffer.from('something else entirely')));
    expect(await objects.hashes()).toEqual([hash]);
    expect((await drain(await store.get(hash))).bytes.equals(first)).toBe(true);
  });

  it('streams the bytes back in chunks, byte for byte', async () => {
    const bytes = randomBytes(3 * 1024 * 1024);
    await store.put(sha(bytes), staged(bytes));
    const read = await drain(await store.get(sha(bytes)));
    expect(read.bytes.equals(bytes)).toBe(true);
    // Handed on as it arrives, not gathered into one buffer first.
    expect(read.chunks).toBeGreaterThan(1);
  });

  it('tells whether an object exists, and deletes it (twice is no error)', async () => {
    const bytes = Buffer.from(`delete me ${Date.now()}`);
    const hash = sha(bytes);
    expect(await store.exists(hash)).toBe(false);
    await store.put(hash, staged(bytes));
    expect(await store.exists(hash)).toBe(true);
    await store.delete(hash);
    expect(await store.exists(hash)).toBe(false);
    expect(await objects.hashes()).not.toContain(hash);
    await expect(store.delete(hash)).resolves.toBeUndefined();
  });

  it('answers StoredObjectMissing for a hash it does not hold', async () => {
    await expect(store.get('0'.repeat(64))).rejects.toBeInstanceOf(StoredObjectMissing);
  });

  it('refuses anything but a SHA-256 hex digest as a name', async () => {
    for (const name of ['../../loftwright.sqlite', `${'a'.repeat(63)}/`, 'A'.repeat(64)]) {
      await expect(store.get(name)).rejects.toThrow(/SHA-256/);
      await expect(store.exists(name)).rejects.toThrow(/SHA-256/);
      await expect(store.delete(name)).rejects.toThrow(/SHA-256/);
      await expect(store.put(name, staged(Buffer.from('x')))).rejects.toThrow(/SHA-256/);
    }
  });
});
