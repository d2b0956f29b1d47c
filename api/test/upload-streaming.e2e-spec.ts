import { readdirSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createStorageTestApp, STORAGES } from './support/storages';
import { createUser, type TestUser } from './support/users';

// Uploads are staged on local disk whichever storage keeps them: the same cases on both.
describe.each(STORAGES)(
  'uploads streamed to disk before the $name: access decided first',
  (storage) => {
    let testApp: TestApp;
    let owner: TestUser;
    let stranger: TestUser;
    let calculationId = '';
    let baseUrl = '';

    beforeAll(async () => {
      testApp = await createStorageTestApp(storage);
      await testApp.app.listen(0, '127.0.0.1');
      baseUrl = `http://127.0.0.1:${(testApp.app.getHttpServer().address() as AddressInfo).port}`;
      owner = await createUser(testApp.app, ['designer'], 'owner');
      stranger = await createUser(testApp.app, ['designer'], 'stranger');
      calculationId = (
        await request(testApp.app.getHttpServer()).post('/api/calculations').set(owner.auth).send({
          title: 'Private',
          kind: 'lift-check',
          inputs: liftCheckInputs(),
          visibility: 'private',
        })
      ).body.id;
    });

    afterAll(async () => {
      await testApp.close();
      await storage.stop();
    });

    /**
     * Starts a multipart upload of a large file but sends only its first chunk, then waits for the
     * answer. A server that read the whole body first would never answer and the test would time out.
     */
    const answerBeforeTheBody = (user: TestUser, path: string) =>
      new Promise<number>((resolve, reject) => {
        const boundary = 'loftwright-boundary';
        const upload = httpRequest(`${baseUrl}${path}`, {
          method: 'POST',
          headers: {
            ...user.auth,
            'Content-Type': `multipart/form-data; boundary=${boundary}`,
            'Content-Length': String(19 * 1024 * 1024),
          },
        });
        upload.on('response', (response) => {
          response.resume();
          upload.destroy();
          resolve(response.statusCode ?? 0);
        });
        upload.on('error', (error) => {
          // The server may close the connection after answering; the answer is what counts.
          if (!upload.destroyed) reject(error);
        });
        upload.write(
          `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.csv"\r\nContent-Type: text/csv\r\n\r\n${'1,2\n'.repeat(16 * 1024)}`,
        );
      });

    it('answers 404 to someone who may not see the calculation before the upload is sent', async () => {
      const status = await answerBeforeTheBody(
        stranger,
        `/api/calculations/${calculationId}/attachments`,
      );
      expect(status).toBe(404);
    });

    it('keeps no temporary file behind a refused upload', async () => {
      const refused = await request(testApp.app.getHttpServer())
        .post(`/api/calculations/${calculationId}/attachments`)
        .set(owner.auth)
        .attach('file', Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200, 0)]), 'tool.png');
      expect(refused.status).toBe(415);
      const uploads = join(testApp.dataDir, 'uploads');
      expect(readdirSync(uploads).filter((name) => name.startsWith('.incoming-'))).toEqual([]);
    });
  },
);
