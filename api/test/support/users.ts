import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { expect } from 'vitest';
import type { Role } from '../../src/users/roles';
import { UsersService } from '../../src/users/users.service';

export interface TestUser {
  id: string;
  email: string;
  token: string;
  auth: { Authorization: string };
}

let counter = 0;

/** Creates an account with the given roles straight through the service and signs it in over HTTP. */
export async function createUser(
  app: NestExpressApplication,
  roles: Role[],
  name = roles.join('-') || 'nobody',
): Promise<TestUser> {
  counter += 1;
  const email = `${name}-${counter}@test.invalid`;
  const password = `password-${counter}-long`;
  const user = await app
    .get(UsersService)
    .create({ email, password, displayName: `Test ${name} ${counter}`, roles });
  const response = await request(app.getHttpServer())
    .post('/api/auth/login')
    .send({ email, password });
  expect(response.status).toBe(200);
  const token = response.body.accessToken as string;
  return { id: user.id, email, token, auth: { Authorization: `Bearer ${token}` } };
}
