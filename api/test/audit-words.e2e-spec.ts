import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

interface AuditItem {
  action: string;
  actor: { displayName: string } | null;
  summary: string;
  changes: { label: string; from: string | null; to: string | null }[];
}

describe('the audit trail in words', () => {
  let testApp: TestApp;
  let admin: TestUser;
  let designer: TestUser;
  const http = () => request(testApp.app.getHttpServer());
  const trail = async (action: string) =>
    (await http().get(`/api/admin/audit?action=${action}`).set(admin.auth)).body
      .items as AuditItem[];

  beforeAll(async () => {
    testApp = await createTestApp();
    admin = await createUser(testApp.app, ['admin'], 'keeper');
    designer = await createUser(testApp.app, ['designer'], 'maker');
  });
  afterAll(async () => {
    await testApp.close();
  });

  it('names the people and says what changed in roles, by name and in words', async () => {
    const changed = await http()
      .patch(`/api/admin/users/${designer.id}`)
      .set(admin.auth)
      .send({ roles: ['designer', 'reviewer'] });
    expect(changed.status).toBe(200);
    const [entry] = await trail('user.roles-change');
    expect(entry?.actor?.displayName).toBe('Test keeper 1');
    expect(entry?.summary).toBe('Test keeper 1 changed Test maker 2’s roles: added reviewer');
    expect(entry?.changes).toEqual([
      { label: 'Roles', from: 'designer', to: 'designer, reviewer' },
    ]);
  });

  it('says a calculation’s rename as old → new, by its title', async () => {
    const signedIn = await http()
      .post('/api/auth/login')
      .send({ email: designer.email, password: 'password-2-long' });
    const auth = { Authorization: `Bearer ${signedIn.body.accessToken as string}` };
    const created = await http()
      .post('/api/calculations')
      .set(auth)
      .send({ title: 'Old name', kind: 'lift-check', inputs: liftCheckInputs() });
    await http()
      .patch(`/api/calculations/${created.body.id}`)
      .set(auth)
      .send({ title: 'New name' });
    const [entry] = await trail('calculation.update');
    expect(entry?.summary).toBe('Test maker 2 changed the details of “New name”');
    expect(entry?.changes).toEqual([{ label: 'Title', from: 'Old name', to: 'New name' }]);
  });

  it('lists every action with its words for a filter', async () => {
    const actions = await http().get('/api/admin/audit/actions').set(admin.auth);
    expect(actions.status).toBe(200);
    expect(actions.body).toContainEqual({ action: 'version.approve', words: 'approved a version' });
  });
});
