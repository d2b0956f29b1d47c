import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import jsQR from 'jsqr';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { readOutbox } from './support/outbox';
import { createUser, type TestUser } from './support/users';

/** A binary PPM (P6) image, as pdftoppm writes it, as RGBA pixels for the QR decoder. */
function readPpm(bytes: Buffer): { width: number; height: number; rgba: Uint8ClampedArray } {
  const header = bytes.subarray(0, 64).toString('latin1');
  const match = /^P6\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(header);
  if (!match) throw new Error('not a binary PPM image');
  const [whole, width, height] = [match[0], Number(match[1]), Number(match[2])];
  const rgb = bytes.subarray(whole.length);
  const rgba = new Uint8ClampedArray(width * height * 4);
  for (let pixel = 0; pixel < width * height; pixel += 1) {
    rgba[pixel * 4] = rgb[pixel * 3] ?? 0;
    rgba[pixel * 4 + 1] = rgb[pixel * 3 + 1] ?? 0;
    rgba[pixel * 4 + 2] = rgb[pixel * 3 + 2] ?? 0;
    rgba[pixel * 4 + 3] = 255;
  }
  return { width, height, rgba };
}

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
    testApp = await createTestApp({ env: { PUBLIC_URL: 'https://loft.example.org/' } });
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
      .send({ comment: 'Envelope mass weighed twice.', timeZone: 'Asia/Kolkata' });
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

  it('prints inputs by label with units, never an internal key, and the verify URL with host', () => {
    const file = join(workDir, 'sheet.pdf');
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', ['-raw', file, '-']).toString();
    // liftCheckInputs(): a 1 m helium sphere, 0.1 kg envelope, 0.2 kg payload, 288.15 K, 101 325 Pa.
    for (const shown of ['Diameter', '1 m', 'Helium', 'Air temperature', '15 °C', '1013 hPa'])
      expect(text).toContain(shown);
    expect(text).not.toMatch(/diameterM|gasId|temperatureK|pressurePa|envelope\./);
    expect(text).toContain(`https://loft.example.org/verify/${fingerprint}`);
    // The approval in the approver's zone (India, UTC+5:30 all year) and in UTC.
    expect(text).toMatch(/GMT\+5:30 \(Asia\/Kolkata\),\s+\d\d:\d\d\s+UTC/);
    // The whole fingerprint on every page's footer.
    const pages = text.split('\f').filter((page) => page.trim() !== '');
    for (const page of pages) expect(page).toContain(fingerprint);
  });

  it('carries a QR code that decodes to the verify URL', () => {
    const file = join(workDir, 'sheet.pdf');
    writeFileSync(file, pdf);
    execFileSync('pdftoppm', ['-r', '150', '-f', '1', '-l', '1', file, join(workDir, 'qr')]);
    const image = readPpm(readFileSync(join(workDir, 'qr-1.ppm')));
    const code = jsQR(image.rgba, image.width, image.height);
    expect(code?.data).toBe(`https://loft.example.org/verify/${fingerprint}`);
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
