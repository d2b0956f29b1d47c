import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { TEST_POSTGRES_ENV } from './support/postgres-test-database';
import { createUser, type TestUser } from './support/users';

/**
 * Two API instances on one PostgreSQL database: each has its own in-process write queue, so only
 * the database can make "exactly one concurrent save wins" hold. Runs in the api-postgres
 * project (SQLite serves one machine's processes, where the queue and SQLite's single writer
 * already decide it).
 */
describe.runIf(process.env[TEST_POSTGRES_ENV])('saves racing on two instances', () => {
  let first: TestApp;
  let second: TestApp;
  let designer: TestUser;
  const secret = 'race-test-signing-key-of-at-least-32-characters';

  beforeAll(async () => {
    first = await createTestApp({ env: { JWT_SECRET: secret } });
    const sharedUrl = process.env.DATABASE_URL as string;
    second = await createTestApp({ env: { JWT_SECRET: secret, DATABASE_URL: sharedUrl } });
    designer = await createUser(first.app, ['designer']);
  });
  afterAll(async () => {
    await second?.close();
    await first?.close();
  });

  it('lets exactly one of eight saves on the same base win; the others get 409, none a 500', async () => {
    const created = await request(first.app.getHttpServer())
      .post('/api/calculations')
      .set(designer.auth)
      .send({ title: 'Race', kind: 'lift-check', inputs: liftCheckInputs() });
    expect(created.status).toBe(201);
    const id = created.body.id as string;
    const saves = Array.from({ length: 8 }, (_, index) =>
      request((index % 2 === 0 ? first : second).app.getHttpServer())
        .post(`/api/calculations/${id}/versions`)
        .set(designer.auth)
        .send({
          baseVersion: 1,
          inputs: liftCheckInputs({ payloadMassKg: 0.2 + index / 100 }),
          note: `save ${index}`,
        }),
    );
    const statuses = (await Promise.all(saves)).map((response) => response.status);
    expect(statuses.filter((status) => status === 201)).toHaveLength(1);
    expect(statuses.filter((status) => status === 409)).toHaveLength(7);
    const detail = await request(second.app.getHttpServer())
      .get(`/api/calculations/${id}`)
      .set(designer.auth);
    expect(detail.body.latestVersion).toBe(2);
  });
});
