import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { readOutbox } from './support/outbox';
import { createUser, type TestUser } from './support/users';

const binary = (response: request.Response, done: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => done(null, Buffer.concat(chunks)));
};

describe('the archived sign-off PDF of an approved version', () => {
  let testApp: TestApp;
  let designer: TestUser;
  let reviewer: TestUser;
  let calculationId: string;
  let pdf: Buffer;
  let fingerprint: string;
  const workDir = mkdtempSync(join(tmpdir(), 'loftwright-pdf-'));
  const http = () => request(testApp.app.getHttpServer());

  beforeAll(async () => {
    testApp = await createTestApp();
    designer = await createUser(testApp.app, ['designer'], 'author');
    reviewer = await createUser(testApp.app, ['reviewer'], 'checker');
    const created = await http()
      .post('/api/calculations')
      .set(designer.auth)
      .send({ title: 'Harbour sphere ρ-check', kind: 'lift-check', inputs: liftCheckInputs() });
    calculationId = created.body.id;
    await http()
      .post(`/api/calculations/${calculationId}/versions/1/submit`)
      .set(designer.auth)
      .send({});
    const approved = await http()
      .post(`/api/calculations/${calculationId}/versions/1/approve`)
      .set(reviewer.auth)
      .send({ comment: 'Envelope mass weighed twice.' });
    expect(approved.status).toBe(200);
    fingerprint = approved.body.fingerprint;
  });

  afterAll(async () => {
    await testApp.close();
    rmSync(workDir, { recursive: true, force: true });
  });

  it('is stored as an attachment of that version', async () => {
    const files = await http()
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(designer.auth);
    const sheet = files.body.find(
      (file: { versionNumber: number | null }) => file.versionNumber === 1,
    );
    expect(sheet).toMatchObject({
      mediaType: 'application/pdf',
      fileName: 'Harbour-sphere-ρ-check-v1-sign-off.pdf',
      uploadedBy: { id: reviewer.id },
    });
    const content = await http()
      .get(sheet.contentUrl)
      .set(designer.auth)
      .buffer(true)
      .parse(binary);
    pdf = content.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('renders with poppler: its first page as an image, and the sheet’s words as text', () => {
    const file = join(workDir, 'sheet.pdf');
    writeFileSync(file, pdf);
    execFileSync('pdftoppm', [
      '-png',
      '-r',
      '40',
      '-f',
      '1',
      '-l',
      '1',
      file,
      join(workDir, 'page'),
    ]);
    const png = readFileSync(join(workDir, 'page-1.png'));
    expect(png.subarray(1, 4).toString()).toBe('PNG');
    const text = execFileSync('pdftotext', ['-layout', file, '-']).toString();
    expect(text).toContain('Harbour sphere ρ-check');
    expect(text).toContain(fingerprint);
    expect(text).toContain('Approved by');
    expect(text).toContain('Envelope mass weighed twice.');
    // Symbols outside IBM Plex's Latin set come from the fallback font, not as empty boxes.
    expect(text).toMatch(/ρ_air/);
    expect(text).toContain('→');
  });

  it('goes with the approval mail', async () => {
    const mail = await readOutbox(testApp.app);
    const approval = mail.find((message) => message.subject.startsWith('Approved: Harbour sphere'));
    expect(approval?.attachments).toEqual([
      {
        filename: 'Harbour-sphere-ρ-check-v1-sign-off.pdf',
        contentType: 'application/pdf',
        sizeBytes: pdf.length,
      },
    ]);
  });

  it('stays: its author cannot remove it, unlike an ordinary upload', async () => {
    const files = await http()
      .get(`/api/calculations/${calculationId}/attachments`)
      .set(reviewer.auth);
    const sheet = files.body.find(
      (file: { versionNumber: number | null }) => file.versionNumber === 1,
    );
    const removed = await http().delete(`/api/attachments/${sheet.id}`).set(reviewer.auth);
    expect(removed.status).toBe(403);
  });
});
