import nodemailer from 'nodemailer';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MailService } from '../src/mail/mail.service';
import { createTestApp, type TestApp } from './support/create-test-app';
import { readOutbox } from './support/outbox';
import { createUser } from './support/users';

describe('the local mail server takes mail only from the product', () => {
  let testApp: TestApp;
  let port: number;

  beforeAll(async () => {
    testApp = await createTestApp();
    port = testApp.app.get(MailService).localServerPort ?? 0;
    expect(port).toBeGreaterThan(0);
  });

  afterAll(async () => {
    await testApp.close();
  });

  const forge = (auth?: { user: string; pass: string }) =>
    nodemailer
      .createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true, auth })
      .sendMail({
        from: 'no-reply@loftwright.invalid',
        to: 'victim@example.org',
        subject: 'Reset your Loftwright password',
        text: 'http://attacker.example/reset-password?token=forged',
      });

  it('refuses a message from another process, with no credential or a guessed one', async () => {
    await expect(forge()).rejects.toThrow();
    await expect(forge({ user: 'loftwright', pass: 'guess' })).rejects.toThrow();
    const outbox = await readOutbox(testApp.app);
    expect(outbox.some((item) => item.text.includes('attacker.example'))).toBe(false);
  });

  it('still delivers the product’s own mail to the outbox', async () => {
    const user = await createUser(testApp.app, ['designer'], 'forgetful');
    const asked = await request(testApp.app.getHttpServer())
      .post('/api/auth/password-reset/request')
      .send({ email: user.email });
    expect(asked.status).toBeLessThan(300);
    const outbox = await readOutbox(testApp.app);
    expect(outbox.some((item) => item.to.includes(user.email))).toBe(true);
  });
});
