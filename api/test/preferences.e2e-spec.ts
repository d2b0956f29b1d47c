import Database from 'better-sqlite3';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { registerThroughMail } from './support/users';

const NUMBER_FORMAT_MESSAGE = 'numberFormat must be one of: point-comma, comma-space, comma-point';
const CURRENCY_MESSAGE = 'currency must be a three-letter ISO 4217 code such as EUR';

/** The account preferences: unit system, number format and currency. */
describe('preferences', () => {
  let testApp: TestApp;
  let counter = 0;
  const http = () => request(testApp.app.getHttpServer());

  /** Registers a new account over HTTP and returns its answer and a bearer header. */
  async function register(extra: Record<string, unknown> = {}) {
    counter += 1;
    const response = await registerThroughMail(testApp.app, {
      email: `person-${counter}@example.org`,
      password: 'a-long-password',
      displayName: `Person ${counter}`,
      ...extra,
    });
    const auth = { Authorization: `Bearer ${response.body.accessToken as string}` };
    return { response, auth };
  }

  const me = async (auth: { Authorization: string }) =>
    (await http().get('/api/auth/me').set(auth)).body;

  beforeAll(async () => {
    testApp = await createTestApp();
  });
  afterAll(async () => {
    await testApp.close();
  });

  describe('POST /api/auth/register', () => {
    it('gives an account SI units, point-comma numbers and EUR when nothing is sent', async () => {
      const { response, auth } = await register();
      expect(response.status).toBe(201);
      expect(response.body.user).toMatchObject({
        unitSystem: 'si',
        numberFormat: 'point-comma',
        currency: 'EUR',
      });
      expect(await me(auth)).toMatchObject({
        unitSystem: 'si',
        numberFormat: 'point-comma',
        currency: 'EUR',
      });
    });

    it.each(['point-comma', 'comma-space', 'comma-point'])(
      'keeps the number format %s guessed by the browser',
      async (numberFormat) => {
        const { response, auth } = await register({ numberFormat });
        expect(response.status).toBe(201);
        expect(response.body.user.numberFormat).toBe(numberFormat);
        expect((await me(auth)).numberFormat).toBe(numberFormat);
        expect((await me(auth)).currency).toBe('EUR');
      },
    );

    it.each([
      ['an unknown id', 'comma-comma'],
      ['a locale instead of an id', 'de-DE'],
      ['null', null],
      ['a number', 1],
    ])('refuses %s as numberFormat with 400 naming it, and makes no account', async (_, value) => {
      const email = `refused-${String(value)}@example.org`;
      const response = await http()
        .post('/api/auth/register')
        .send({ email, password: 'a-long-password', displayName: 'R', numberFormat: value });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('numberFormat');
      expect(response.body.message).toBe(`numberFormat: ${NUMBER_FORMAT_MESSAGE}`);
      const login = await http()
        .post('/api/auth/login')
        .send({ email, password: 'a-long-password' });
      expect(login.status).toBe(401);
    });

    it('takes no currency at registration', async () => {
      const { response } = await register({ currency: 'USD' });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('currency');
    });
  });

  describe('PATCH /api/auth/me/preferences', () => {
    it('changes each preference on its own and leaves the others', async () => {
      const { auth } = await register();

      const units = await http().patch('/api/auth/me/preferences').set(auth).send({
        unitSystem: 'us',
      });
      expect(units.status).toBe(200);
      expect(units.body).toMatchObject({
        unitSystem: 'us',
        numberFormat: 'point-comma',
        currency: 'EUR',
      });

      const numbers = await http().patch('/api/auth/me/preferences').set(auth).send({
        numberFormat: 'comma-space',
      });
      expect(numbers.status).toBe(200);
      expect(numbers.body).toMatchObject({
        unitSystem: 'us',
        numberFormat: 'comma-space',
        currency: 'EUR',
      });

      const money = await http().patch('/api/auth/me/preferences').set(auth).send({
        currency: 'CHF',
      });
      expect(money.status).toBe(200);
      expect(money.body).toMatchObject({
        unitSystem: 'us',
        numberFormat: 'comma-space',
        currency: 'CHF',
      });

      expect(await me(auth)).toMatchObject({
        unitSystem: 'us',
        numberFormat: 'comma-space',
        currency: 'CHF',
      });
    });

    it('changes all three at once', async () => {
      const { auth } = await register();
      const response = await http()
        .patch('/api/auth/me/preferences')
        .set(auth)
        .send({ unitSystem: 'us', numberFormat: 'comma-point', currency: 'GBP' });
      expect(response.status).toBe(200);
      expect(await me(auth)).toMatchObject({
        unitSystem: 'us',
        numberFormat: 'comma-point',
        currency: 'GBP',
      });
    });

    it('stores them in the user table columns the migration added', async () => {
      const { response, auth } = await register({ numberFormat: 'comma-point' });
      await http().patch('/api/auth/me/preferences').set(auth).send({ currency: 'JPY' });
      const db = new Database(join(testApp.dataDir, 'loftwright.sqlite'), { readonly: true });
      try {
        const row = db
          .prepare('SELECT "unit_system", "number_format", "currency" FROM "user" WHERE "id" = ?')
          .get(response.body.user.id);
        expect(row).toEqual({ unit_system: 'si', number_format: 'comma-point', currency: 'JPY' });
      } finally {
        db.close();
      }
    });

    it('refuses an empty change with 400 naming every preference it takes', async () => {
      const { auth } = await register();
      const response = await http().patch('/api/auth/me/preferences').set(auth).send({});
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('unitSystem');
      expect(response.body.message).toBe(
        'Send at least one preference to change: unitSystem, numberFormat, currency.',
      );
      expect(response.body.issues.map((issue: { field: string }) => issue.field)).toEqual([
        'unitSystem',
        'numberFormat',
        'currency',
      ]);
    });

    it.each([
      ['unitSystem', 'metric', 'unitSystem must be one of: si, us'],
      ['unitSystem', null, 'unitSystem must be one of: si, us'],
      ['numberFormat', 'comma', NUMBER_FORMAT_MESSAGE],
      ['numberFormat', '1,234.5', NUMBER_FORMAT_MESSAGE],
      ['numberFormat', null, NUMBER_FORMAT_MESSAGE],
      ['currency', 'eur', CURRENCY_MESSAGE],
      ['currency', 'EURO', CURRENCY_MESSAGE],
      ['currency', 'E1R', CURRENCY_MESSAGE],
      ['currency', '€', CURRENCY_MESSAGE],
      ['currency', '', CURRENCY_MESSAGE],
      ['currency', 978, CURRENCY_MESSAGE],
      ['currency', null, CURRENCY_MESSAGE],
    ])('refuses %s %j with 400 naming the field', async (field, value, reason) => {
      const { auth } = await register();
      const response = await http()
        .patch('/api/auth/me/preferences')
        .set(auth)
        .send({ [field]: value });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe(field);
      expect(response.body.message).toBe(`${field}: ${reason}`);
    });

    it('changes nothing when one of the values sent is refused', async () => {
      const { auth } = await register();
      const response = await http()
        .patch('/api/auth/me/preferences')
        .set(auth)
        .send({ unitSystem: 'us', numberFormat: 'comma-space', currency: 'euro' });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('currency');
      expect(await me(auth)).toMatchObject({
        unitSystem: 'si',
        numberFormat: 'point-comma',
        currency: 'EUR',
      });
    });

    it('refuses a field it does not know', async () => {
      const { auth } = await register();
      const response = await http()
        .patch('/api/auth/me/preferences')
        .set(auth)
        .send({ currency: 'USD', locale: 'en-US' });
      expect(response.status).toBe(400);
      expect(response.body.field).toBe('locale');
    });

    it('needs a signed-in account', async () => {
      const response = await http().patch('/api/auth/me/preferences').send({ currency: 'USD' });
      expect(response.status).toBe(401);
    });
  });

  it('documents the preferences in the OpenAPI schemas', async () => {
    const spec = await http().get('/api/docs-json');
    expect(spec.status).toBe(200);
    const { UpdatePreferencesDto, RegisterDto } = spec.body.components.schemas;
    expect(UpdatePreferencesDto.properties.unitSystem.enum).toEqual(['si', 'us']);
    expect(UpdatePreferencesDto.properties.numberFormat.enum).toEqual([
      'point-comma',
      'comma-space',
      'comma-point',
    ]);
    expect(UpdatePreferencesDto.properties.currency.pattern).toBe('^[A-Z]{3}$');
    expect(UpdatePreferencesDto.required ?? []).toEqual([]);
    expect(RegisterDto.properties.numberFormat.enum).toEqual([
      'point-comma',
      'comma-space',
      'comma-point',
    ]);
    expect(RegisterDto.required).not.toContain('numberFormat');
    expect(Object.keys(spec.body.paths['/api/auth/me/preferences'].patch.responses).sort()).toEqual(
      ['200', '400'],
    );
  });
});
