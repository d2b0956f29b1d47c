import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { expect } from 'vitest';
import type { Role } from '../../src/users/roles';
import { readOutbox } from './outbox';

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
  // Imported here, not at the top: a test that reloads the app's modules (vi.resetModules, to boot
  // it with other settings) gets the UsersService class the running app was built from.
  const { UsersService } = await import('../../src/users/users.service');
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

/** The token of the newest registration link mailed to an address, from the local outbox. */
export async function mailedRegistrationToken(
  app: NestExpressApplication,
  email: string,
): Promise<string> {
  const mail = (await readOutbox(app)).find(
    (item) =>
      item.to.includes(email.trim().toLowerCase()) &&
      item.subject.startsWith('Finish creating your Loftwright account'),
  );
  const token = mail?.text.match(/\/confirm-account\?token=([\w-]+)/)?.[1];
  if (!token) throw new Error(`no registration link was mailed to ${email}`);
  return token;
}

/**
 * Registers over HTTP as a person does: the register request, then the link mailed to the address
 * (read from the local outbox). Answers the response that signed the new account in.
 */
export async function registerThroughMail(
  app: NestExpressApplication,
  body: Record<string, unknown> & { email: string },
): Promise<request.Response> {
  const server = app.getHttpServer();
  const registered = await request(server).post('/api/auth/register').send(body);
  // The first account of an empty database is signed in at once; anything but 202 is the answer.
  if (registered.status !== 202) return registered;
  const token = await mailedRegistrationToken(app, body.email);
  return request(server).post('/api/auth/register/confirm').send({ token });
}
