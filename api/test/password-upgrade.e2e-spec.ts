import bcrypt from 'bcryptjs';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { createUser } from './support/users';

describe('passwords hashed before scrypt', () => {
  let testApp: TestApp;
  beforeAll(async () => {
    testApp = await createTestApp();
  });
  afterAll(async () => {
    await testApp.close();
  });

  it('sign in with an old bcrypt hash, which is then replaced by an scrypt one', async () => {
    const user = await createUser(testApp.app, ['designer'], 'veteran');
    const db = testApp.app.get(DataSource);
    await db.query(`UPDATE "user" SET "password_hash" = ? WHERE "id" = ?`, [
      bcrypt.hashSync('an old but good password', 4),
      user.id,
    ]);
    const login = () =>
      request(testApp.app.getHttpServer())
        .post('/api/auth/login')
        .send({ email: user.email, password: 'an old but good password' });
    expect((await login()).status).toBe(200);
    const [row] = (await db.query(`SELECT "password_hash" FROM "user" WHERE "id" = ?`, [
      user.id,
    ])) as { password_hash: string }[];
    expect(row?.password_hash).toMatch(/^scrypt\$10\$8\$1\$/);
    expect((await login()).status).toBe(200);
  });
});
