import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';

/** s3rver's fixed credentials: it checks request signatures against these. */
export const FAKE_S3_KEY = 'S3RVER';

export interface FakeS3 {
  readonly endpoint: string;
  readonly bucket: string;
  /** The variables that point Loftwright (or a client) at this server, under `prefix`. */
  env(prefix: string): Record<string, string>;
  stop(): Promise<void>;
}

/**
 * A local S3-compatible server (s3rver) on a free port, keeping its objects in a fresh temporary
 * folder, with one bucket made. Stopped and its folder removed by `stop`.
 */
export async function startFakeS3(bucket = 'loftwright-test'): Promise<FakeS3> {
  const directory = mkdtempSync(join(tmpdir(), 'loftwright-s3-'));
  const server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory,
    configureBuckets: [{ name: bucket }],
  });
  const { port } = await server.run();
  const endpoint = `http://127.0.0.1:${port}`;
  return {
    endpoint,
    bucket,
    env: (prefix) => ({
      STORAGE_URL: `s3://${bucket}/${prefix}`,
      STORAGE_ENDPOINT: endpoint,
      AWS_ACCESS_KEY_ID: FAKE_S3_KEY,
      AWS_SECRET_ACCESS_KEY: FAKE_S3_KEY,
      AWS_REGION: 'us-east-1',
    }),
    async stop() {
      await server.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}
