import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fillCard } from '@loftwright/buoyancy';
import jsQR from 'jsqr';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';
import { liftCheckInputs } from './support/fixtures';
import { createUser, type TestUser } from './support/users';

/** A hydrogen sphere sized at sea level in the 1976 standard atmosphere. */
const sizingInputs = {
  shape: { shape: 'sphere' },
  envelopeMass: { kind: 'fixed', massKg: 0.3 },
  payloadMassKg: 0.5,
  target: { kind: 'freeLift', freeLiftKg: 0.25 },
  gas: { gasId: 'hydrogen' },
  ambient: { mode: 'standard', altitudeM: 0 },
};

/** 50 L cylinders at 200 bar gauge and 15 °C, two of them. */
const cylinderQuery = {
  cylinderWaterVolumeM3: '0.05',
  cylinderFillPressurePa: '20000000',
  cylinderTemperatureK: '288.15',
  cylinderCount: '2',
};

/** A binary PPM (P6) image, as pdftoppm writes it, as RGBA pixels for the QR decoder. */
function readPpm(bytes: Buffer): { width: number; height: number; rgba: Uint8ClampedArray } {
  const match = /^P6\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(bytes.subarray(0, 64).toString('latin1'));
  if (!match) throw new Error('not a binary PPM image');
  const [width, height] = [Number(match[1]), Number(match[2])];
  const rgb = bytes.subarray(match[0].length);
  const rgba = new Uint8ClampedArray(width * height * 4);
  for (let pixel = 0; pixel < width * height; pixel += 1) {
    for (let channel = 0; channel < 3; channel += 1) {
      rgba[pixel * 4 + channel] = rgb[pixel * 3 + channel] ?? 0;
    }
    rgba[pixel * 4 + 3] = 255;
  }
  return { width, height, rgba };
}

const binary = (response: request.Response, done: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => done(null, Buffer.concat(chunks)));
};

describe('the fill card of a saved version', () => {
  let testApp: TestApp;
  let owner: TestUser;
  let stranger: TestUser;
  let sizingId: string;
  let liftCheckId: string;
  let fingerprint: string;
  const workDir = mkdtempSync(join(tmpdir(), 'loftwright-fill-card-'));
  const http = () => request(testApp.app.getHttpServer());
  const cardPath = (id: string, suffix = '') =>
    `/api/calculations/${id}/versions/1/fill-card${suffix}`;

  beforeAll(async () => {
    testApp = await createTestApp({ env: { PUBLIC_URL: 'https://loft.example.org/' } });
    owner = await createUser(testApp.app, ['designer'], 'crew');
    stranger = await createUser(testApp.app, ['designer'], 'stranger');
    const sizing = await http()
      .post('/api/calculations')
      .set(owner.auth)
      .send({ title: 'Harbour hydrogen sphere', kind: 'envelope-sizing', inputs: sizingInputs });
    expect(sizing.status).toBe(201);
    sizingId = sizing.body.id;
    fingerprint = sizing.body.latest.fingerprint;
    const check = await http()
      .post('/api/calculations')
      .set(owner.auth)
      .send({ title: 'Plain check', kind: 'lift-check', inputs: liftCheckInputs() });
    liftCheckId = check.body.id;
  });

  afterAll(async () => {
    await testApp.close();
    rmSync(workDir, { recursive: true, force: true });
  });

  it("answers the engine's numbers, recomputed from the saved inputs", async () => {
    const response = await http()
      .get(cardPath(sizingId))
      .query({ fillerMassKg: '0.12', ...cylinderQuery })
      .set(owner.auth);
    expect(response.status).toBe(200);
    const expected = fillCard('envelope-sizing', sizingInputs, {
      fillerMassKg: 0.12,
      cylinder: { waterVolumeM3: 0.05, fillPressurePa: 2e7, temperatureK: 288.15, count: 2 },
    });
    expect(response.body.card).toEqual(JSON.parse(JSON.stringify(expected)));
    expect(response.body).toMatchObject({
      fingerprint,
      versionNumber: 1,
      verifyUrl: `https://loft.example.org/verify/${fingerprint}`,
    });
    // check-values §6.1: neck lift = free lift + payload (0.25 + 0.5 kg); less the 0.12 kg filler.
    expect(response.body.card.neckLift.value).toBeCloseTo(0.75, 12);
    expect(response.body.card.fillerWeight.value).toBeCloseTo(0.63, 12);
  });

  it('is read under the same rule as the version: a stranger gets 404', async () => {
    const response = await http()
      .get(cardPath(sizingId))
      .query({ fillerMassKg: '0.12' })
      .set(stranger.auth);
    expect(response.status).toBe(404);
  });

  it.each([
    [{}, 'fillerMassKg'],
    [{ fillerMassKg: 'heavy' }, 'fillerMassKg'],
    // Number('0x0') is 0 and Number('0b1') is 1: such literals are refused, not reread.
    [{ fillerMassKg: '0x0' }, 'fillerMassKg'],
    [{ fillerMassKg: '0.1', freeLiftKg: '0b1' }, 'freeLiftKg'],
    [{ fillerMassKg: '5' }, 'fillerMassKg'],
    [{ fillerMassKg: '0.1', freeLiftKg: '-2' }, 'freeLiftKg'],
    [{ fillerMassKg: '0.1', cylinderWaterVolumeM3: '0.05' }, 'cylinderFillPressurePa'],
    [
      { fillerMassKg: '0.1', ...cylinderQuery, cylinderTemperatureK: '400' },
      'cylinderTemperatureK',
    ],
  ])('answers 422 naming the field for %o', async (query, field) => {
    const response = await http().get(cardPath(sizingId)).query(query).set(owner.auth);
    expect(response.status).toBe(422);
    expect(response.body.field).toBe(field);
  });

  it('answers 422 for a kind without a fill card', async () => {
    const response = await http()
      .get(cardPath(liftCheckId))
      .query({ fillerMassKg: '0.1' })
      .set(owner.auth);
    expect(response.status).toBe(422);
    expect(response.body.field).toBe('kind');
  });

  describe('as a PDF', () => {
    let pdfFile: string;
    let text: string;

    beforeAll(async () => {
      const response = await http()
        .get(cardPath(sizingId, '.pdf'))
        .query({ fillerMassKg: '0.12', ...cylinderQuery })
        .set(owner.auth)
        .buffer(true)
        .parse(binary);
      expect(response.status).toBe(200);
      expect(response.headers['content-type']).toBe('application/pdf');
      pdfFile = join(workDir, 'card.pdf');
      writeFileSync(pdfFile, response.body as Buffer);
      text = execFileSync('pdftotext', ['-raw', pdfFile, '-']).toString();
    });

    it('fits on one page', () => {
      expect(execFileSync('pdfinfo', [pdfFile]).toString()).toMatch(/^Pages:\s+1$/m);
    });

    it('prints the fingerprint, neck lift, filler weight, stop criterion, cylinders and cautions', () => {
      expect(text).toContain(fingerprint);
      expect(text).toMatch(/Neck lift = free lift \+ payload\s+0\.750 kg/);
      expect(text).toMatch(/Weight to hang on the filler = neck lift − filler\s+0\.630 kg/);
      expect(text).toContain('Stop when');
      expect(text).toMatch(
        /Fill until the balloon just lifts the filler and\s+weight: it balances/,
      );
      expect(text).toMatch(
        /One cylinder is enough: its gauge falls from 200\.0 bar to \d+\.\d bar/,
      );
      expect(text).toContain('Hydrogen is flammable');
      expect(text).toMatch(/local fire and gas codes/);
      expect(text).toContain('DIN 1343');
    });

    it('carries a QR code that decodes to the verify URL', () => {
      execFileSync('pdftoppm', ['-r', '150', '-f', '1', '-l', '1', pdfFile, join(workDir, 'qr')]);
      const image = readPpm(readFileSync(join(workDir, 'qr-1.ppm')));
      const code = jsQR(image.rgba, image.width, image.height);
      expect(code?.data).toBe(`https://loft.example.org/verify/${fingerprint}`);
    });
  });
});
