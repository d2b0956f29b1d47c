import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser } from './support/users';

/** Every entry under `directory` with its permission bits. */
function modes(directory: string): { path: string; mode: number; isDirectory: boolean }[] {
  return readdirSync(directory, { withFileTypes: true }).flatMap((entry) => {
    const path = join(directory, entry.name);
    const here = { path, mode: statSync(path).mode & 0o777, isDirectory: entry.isDirectory() };
    return entry.isDirectory() ? [here, ...modes(path)] : [here];
  });
}

describe('the data folder is private to the server’s account, whatever the umask', () => {
  let testApp: TestApp;
  let previousUmask: number;

  beforeAll(async () => {
    // The most permissive umask there is: anything not set explicitly would come out 0777/0666.
    previousUmask = process.umask(0);
    testApp = await createTestApp();
  });

  afterAll(async () => {
    process.umask(previousUmask);
    await testApp.close();
  });

  it('makes the folder 0700 and the database, its journal files and uploads 0600', async () => {
    const owner = await createUser(testApp.app, ['designer'], 'owner');
    const server = testApp.app.getHttpServer();
    const created = await request(server).post('/api/calculations').set(owner.auth).send({
      title: 'Private bytes',
      kind: 'lift-check',
      inputs: liftCheckInputs(),
      visibility: 'private',
    });
    expect(created.status).toBe(201);
    const uploaded = await request(server)
      .post(`/api/calculations/${created.body.id}/attachments`)
      .set(owner.auth)
      .attach('file', Buffer.from('time_s,scale_kg\n0,0.2\n'), 'readings.csv');
    expect(uploaded.status).toBe(201);

    expect(statSync(testApp.dataDir).mode & 0o777).toBe(0o700);
    const entries = modes(testApp.dataDir);
    const names = entries.map((entry) => entry.path.slice(testApp.dataDir.length + 1));
    expect(names).toEqual(
      // The generated signing key is in the database now, shared by every instance.
      expect.arrayContaining(['loftwright.sqlite', 'loftwright.sqlite-wal']),
    );
    expect(names.some((name) => name.startsWith('uploads/'))).toBe(true);
    const loose = entries.filter((entry) => entry.mode !== (entry.isDirectory ? 0o700 : 0o600));
    expect(loose.map((entry) => `${entry.path} ${entry.mode.toString(8)}`)).toEqual([]);
  });
});
