import { Logger } from '@nestjs/common';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { isLoopbackHost } from '../src/seed/demo-seed.service';
import { createTestApp, type TestApp } from './support/create-test-app';

const demoSignIn = (testApp: TestApp) =>
  request(testApp.app.getHttpServer())
    .post('/api/auth/login')
    .send({ email: 'admin@demo.test', password: 'demo-password-for-tests' });

describe('first run: demo accounts and the first admin', () => {
  let testApp: TestApp | undefined;
  // Each case boots the app from a fresh module graph, so its environment is read anew.
  beforeEach(() => {
    vi.resetModules();
  });
  afterEach(async () => {
    vi.restoreAllMocks();
    await testApp?.close();
    testApp = undefined;
  });

  it('knows which addresses only this machine can reach', () => {
    for (const host of ['127.0.0.1', '127.4.5.6', 'localhost', '::1', '[::1]']) {
      expect(isLoopbackHost(host), host).toBe(true);
    }
    for (const host of ['0.0.0.0', '::', '192.168.1.20', 'loftwright.example.org', '1270.0.0.1']) {
      expect(isLoopbackHost(host), host).toBe(false);
    }
  });

  it('makes the demo on loopback when SEED_DEMO is not set, as `npm start` on a laptop does', async () => {
    testApp = await createTestApp({
      seedDemo: 'unset',
      env: { DEMO_PASSWORD: 'demo-password-for-tests' },
    });
    expect((await demoSignIn(testApp)).status).toBe(200);
  });

  it('makes no demo on a network address unless SEED_DEMO=1, and then says so loudly', async () => {
    testApp = await createTestApp({
      seedDemo: 'unset',
      env: { HOST: '0.0.0.0', DEMO_PASSWORD: 'demo-password-for-tests' },
    });
    expect((await demoSignIn(testApp)).status).toBe(401);
    await testApp.close();
    vi.resetModules();

    const warn = vi.spyOn(Logger.prototype, 'warn');
    testApp = await createTestApp({
      seedDemo: true,
      env: { HOST: '0.0.0.0', DEMO_PASSWORD: 'demo-password-for-tests' },
    });
    expect((await demoSignIn(testApp)).status).toBe(200);
    expect(warn.mock.calls.map((call) => String(call[0])).join('\n')).toMatch(
      /DEMO ACCOUNTS WITH THE PUBLISHED PASSWORD.*0\.0\.0\.0/,
    );
  });

  it('makes exactly one admin of six registrations racing on an empty database', async () => {
    testApp = await createTestApp({ seedDemo: false });
    const server = testApp.app.getHttpServer();
    const answers = await Promise.all(
      Array.from({ length: 6 }, (_, index) =>
        request(server)
          .post('/api/auth/register')
          .send({
            email: `racer${index}@example.org`,
            password: 'a long enough password',
            displayName: `Racer ${index}`,
          }),
      ),
    );
    // One is the first account, signed in as admin; the others are asked to confirm by mail.
    const signedIn = answers.filter((answer) => answer.status === 201);
    expect(signedIn).toHaveLength(1);
    expect(signedIn[0]?.body.user.roles).toContain('admin');
    expect(answers.filter((answer) => answer.status === 202)).toHaveLength(5);
  });
});
