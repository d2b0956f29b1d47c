import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { vi } from 'vitest';
import { createTestApp, type TestApp } from './create-test-app';
import { FAKE_S3_KEY, type FakeS3, startFakeS3 } from './fake-s3';

/** What a test may ask of the stored objects, whichever storage keeps them. */
export interface StoredObjects {
  /** Top-level names: fan-out folders on disk, first key segments in a bucket. */
  topLevel(): Promise<string[]>;
  /** Every stored object's hash. */
  hashes(): Promise<string[]>;
}

/** One storage the API runs on in a test: the env that selects it, and a look at what it holds. */
export interface StorageUnderTest {
  readonly name: string;
  /** Starts what the storage needs (the fake S3 server) and answers the env for createTestApp. */
  start(): Promise<Record<string, string>>;
  objects(dataDir: string): StoredObjects;
  stop(): Promise<void>;
}

const PREFIX = 'loftwright/files';

function localFolder(): StorageUnderTest {
  return {
    name: 'local folder',
    start: async () => ({}),
    objects: (dataDir) => {
      const root = join(dataDir, 'uploads');
      const fanOut = () => readdirSync(root).filter((name) => !name.startsWith('.'));
      return {
        topLevel: async () => readdirSync(root),
        hashes: async () => fanOut().flatMap((folder) => readdirSync(join(root, folder))),
      };
    },
    stop: async () => undefined,
  };
}

function fakeS3Bucket(): StorageUnderTest {
  let fake: FakeS3 | undefined;
  let client: S3Client | undefined;
  const keys = async (): Promise<string[]> => {
    if (!fake || !client) throw new Error('The fake S3 server is not running');
    const listed = await client.send(
      new ListObjectsV2Command({ Bucket: fake.bucket, Prefix: `${PREFIX}/` }),
    );
    return (listed.Contents ?? []).map((item) => (item.Key ?? '').slice(PREFIX.length + 1));
  };
  return {
    name: 'S3 (s3rver)',
    async start() {
      fake = await startFakeS3();
      const env = fake.env(PREFIX);
      client = new S3Client({
        endpoint: fake.endpoint,
        forcePathStyle: true,
        region: 'us-east-1',
        credentials: { accessKeyId: FAKE_S3_KEY, secretAccessKey: FAKE_S3_KEY },
      });
      return env;
    },
    objects: () => ({
      topLevel: async () => [...new Set((await keys()).map((key) => key.split('/')[0] ?? ''))],
      hashes: async () => (await keys()).map((key) => key.split('/')[1] ?? ''),
    }),
    // May be called twice (a test stopping the server early): only the first stops it.
    async stop() {
      client?.destroy();
      const running = fake;
      fake = undefined;
      client = undefined;
      await running?.stop();
    },
  };
}

/** Both storages, for `describe.each`: the same cases run on the local folder and on S3. */
export const STORAGES: readonly StorageUnderTest[] = [localFolder(), fakeS3Bucket()];

/**
 * Starts `storage` and boots the app on it. The app's modules are reloaded first: its
 * configuration is read once, when AppModule is first imported, and an earlier case in the same
 * file may have booted it on the other storage.
 */
export async function createStorageTestApp(storage: StorageUnderTest): Promise<TestApp> {
  const env = await storage.start();
  vi.resetModules();
  return createTestApp({ env });
}
