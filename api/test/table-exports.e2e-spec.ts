import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

const binary = (response: request.Response, done: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => done(null, Buffer.concat(chunks)));
};

async function readXlsx(bytes: Buffer): Promise<unknown[][]> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(bytes as unknown as ArrayBuffer);
  const rows: unknown[][] = [];
  workbook.worksheets[0]?.eachRow((row) => rows.push((row.values as unknown[]).slice(1)));
  return rows;
}

describe('table exports (CSV and XLSX)', () => {
  let testApp: TestApp;
  let owner: TestUser;
  let admin: TestUser;
  let other: TestUser;
  let calculationId: string;
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp();
    owner = await createUser(testApp.app, ['designer'], 'owner');
    other = await createUser(testApp.app, ['designer'], 'other');
    admin = await createUser(testApp.app, ['admin'], 'admin');
    for (const title of ['=HYPERLINK("http://x.invalid","click")', 'Dune sphere, 1.2 m']) {
      const created = await http()
        .post('/api/calculations')
        .set(owner.auth)
        .send({ title, kind: 'lift-check', inputs: liftCheckInputs(), tags: ['spring'] });
      calculationId = created.body.id;
    }
    await http()
      .post('/api/calculations')
      .set(other.auth)
      .send({ title: 'Private to other', kind: 'lift-check', inputs: liftCheckInputs() });
    await http()
      .post(`/api/calculations/${calculationId}/versions/1/fill-logs`)
      .set(owner.auth)
      .send({
        filledAt: '2026-11-28T09:40:00Z',
        place: 'North hut',
        gasSource: 'cylinder',
        ambient: { temperatureK: 288.15, pressurePa: 101325 },
        readings: [{ kind: 'ballast', timeS: 0, ballastMassKg: 0.5, scaleReadingKg: 0.31 }],
      });
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('exports the calculations the user may see as CSV, quoting commas and defusing formulas', async () => {
    const response = await http()
      .get('/api/calculations/export?format=csv&sort=title')
      .set(owner.auth);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(response.headers['content-disposition']).toBe(
      'attachment; filename="loftwright-calculations.csv"',
    );
    const parsed = Papa.parse<string[]>(response.text.replace(/^\uFEFF/, '').trim());
    const [header, ...rows] = parsed.data;
    expect(header?.slice(0, 4)).toEqual(['Title', 'Kind', 'Status', 'Latest version']);
    const titles = rows.map((row) => row[0]);
    // Only the caller's own and shared calculations; the comma survives as one cell.
    expect(titles).toContain('Dune sphere, 1.2 m');
    expect(titles).not.toContain('Private to other');
    // OWASP CSV injection advice: text that would run as a formula starts with an apostrophe.
    expect(titles).toContain(`'=HYPERLINK("http://x.invalid","click")`);
    expect(rows.find((row) => row[0] === 'Dune sphere, 1.2 m')?.[1]).toBe('Lift check');
  });

  it('keeps the list filters in the export', async () => {
    const response = await http().get('/api/calculations/export?q=Dune').set(owner.auth);
    const rows = Papa.parse<string[]>(response.text.replace(/^\uFEFF/, '').trim()).data.slice(1);
    expect(rows.map((row) => row[0])).toEqual(['Dune sphere, 1.2 m']);
  });

  it('exports the same table as a spreadsheet that opens, with typed cells', async () => {
    const response = await http()
      .get('/api/calculations/export?format=xlsx&sort=title')
      .set(owner.auth)
      .buffer(true)
      .parse(binary);
    expect(response.headers['content-type']).toBe(
      'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
    );
    const rows = await readXlsx(response.body as Buffer);
    expect(rows[0]?.slice(0, 2)).toEqual(['Title', 'Kind']);
    const dune = rows.find((row) => row[0] === 'Dune sphere, 1.2 m');
    expect(dune?.[3]).toBe(1);
    expect(dune?.[7]).toBeInstanceOf(Date);
  });

  it('exports fill logs with their measured and predicted lift', async () => {
    const response = await http()
      .get(`/api/calculations/${calculationId}/fill-logs/export?format=xlsx`)
      .set(owner.auth)
      .buffer(true)
      .parse(binary);
    expect(response.status).toBe(200);
    const [header, row] = await readXlsx(response.body as Buffer);
    const cell = (name: string) => row?.[(header ?? []).indexOf(name)];
    expect(cell('Place')).toBe('North hut');
    // 0.500 kg ballast − 0.310 kg on the scale.
    expect(cell('Measured net lift (kg)')).toBeCloseTo(0.19, 12);
    expect(typeof cell('Predicted net lift (kg)')).toBe('number');
    expect(cell('Air temperature (°C)')).toBeCloseTo(15, 9);
  });

  it('exports the audit trail for admins only', async () => {
    const response = await http()
      .get('/api/admin/audit/export?action=calculation.create')
      .set(admin.auth);
    expect(response.status).toBe(200);
    const rows = Papa.parse<string[]>(response.text.replace(/^\uFEFF/, '').trim()).data;
    expect(rows[0]).toEqual(['Time (UTC)', 'Who', 'What happened', 'Changes']);
    // In words, by name: "<person> created a calculation: “<title>”", never an id or JSON.
    expect(rows.slice(1).every((row) => / created a calculation: “/.test(row[2] ?? ''))).toBe(true);
    expect(rows.slice(1).some((row) => /[{}]|[0-9a-f]{8}-[0-9a-f]{4}/.test(row.join(' ')))).toBe(
      false,
    );
    expect(rows.length - 1).toBe(3);
    expect((await http().get('/api/admin/audit/export').set(owner.auth)).status).toBe(403);
  });

  it('refuses an unknown format, naming the field', async () => {
    const response = await http().get('/api/calculations/export?format=pdf').set(owner.auth);
    expect(response.status).toBe(400);
    expect(response.body.message).toMatch(/format must be one of: csv, xlsx/);
  });

  it('hides the fill logs of a calculation the user may not see', async () => {
    const response = await http()
      .get(`/api/calculations/${calculationId}/fill-logs/export`)
      .set(other.auth);
    expect(response.status).toBe(404);
  });
});
