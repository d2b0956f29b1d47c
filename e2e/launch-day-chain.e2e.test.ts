import { execFileSync } from 'node:child_process';
import { readFile } from 'node:fs/promises';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';

/** A stretching sphere of the library's 300 g starter, sized for a 1.4 kg payload. */
const SIZING_INPUTS = {
  shape: { shape: 'sphere' },
  envelopeMass: { kind: 'fixed', massKg: 0.3 },
  payloadMassKg: 1.4,
  target: { kind: 'freeLift', freeLiftKg: 0.5 },
  gas: { gasId: 'helium' },
  ambient: { mode: 'standard', altitudeM: 120 },
};

/** A sounding with temperatures: heights in metres, speeds in m/s, temperatures in °C. */
const WIND_FILE = [
  'height_m direction_deg speed_ms temp_c',
  '120 250 4 12',
  '3000 260 12 -5',
  '9000 270 30 -45',
  '11000 275 38 -56',
  '20000 270 10 -56',
  '30000 90 6 -46',
].join('\n');

interface DetailAnswer {
  id: string;
  latestVersion: number;
  latest: { inputs: Record<string, unknown> } | null;
}

describe('a balloon team goes from payload to landing area to fill card without retyping', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let consoleErrors: string[];
  let token = '';

  const api = async (path: string): Promise<DetailAnswer> => {
    const answer = await page.request.get(`${product.baseUrl}/api${path}`, {
      headers: { authorization: `Bearer ${token}` },
    });
    if (answer.status() !== 200) throw new Error(`${path}: ${await answer.text()}`);
    return (await answer.json()) as DetailAnswer;
  };
  const calculationIdInUrl = () => new URL(page.url()).pathname.split('/').at(-1) ?? '';

  beforeAll(async () => {
    product = await startProduct();
    browser = await launchBrowser();
    page = await browser.context.newPage();
    consoleErrors = collectConsoleErrors(page);
    await page.goto(`${product.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill('designer@demo.test');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${product.baseUrl}/calculations`);
    token = (await page.evaluate(() => localStorage.getItem('loftwright.session'))) ?? '';
  });

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  it('sizing → flight with a wind file → landing area → fill card → rules check', async () => {
    screenshotOnFailure(() => page, 'launch-day-chain');
    const created = await page.request.post(`${product.baseUrl}/api/calculations`, {
      headers: { authorization: `Bearer ${token}` },
      data: { title: 'Launch-day sizing', kind: 'envelope-sizing', inputs: SIZING_INPUTS },
    });
    expect(created.status()).toBe(201);
    const sizingId = ((await created.json()) as { id: string }).id;

    // Sizing → flight: the size, gas, envelope and payload travel; the flight links back.
    await page.goto(`${product.baseUrl}/calculations/${sizingId}`);
    await page.getByRole('button', { name: 'Continue as flight profile' }).click();
    await page.waitForURL((url) => !url.pathname.endsWith(sizingId));
    const flightId = calculationIdInUrl();
    await expect.poll(() => page.getByText(/Still to fill: .*burst/i).count()).toBeGreaterThan(0);

    // The burst diameter comes from the team's library, not from the keyboard.
    await page.getByRole('button', { name: 'Choose from the envelope library' }).click();
    await page.getByRole('combobox', { name: 'Library envelope' }).click();
    await page.locator('.ant-select-item-option[title="Practice sphere 300 g"]').click();
    await page.getByRole('button', { name: 'Use its figures' }).click();

    // The site is new information for the flight; the winds come from a file.
    await page.getByRole('textbox', { name: /^Latitude/ }).fill('47.5');
    await page.getByRole('textbox', { name: /^Longitude/ }).fill('8.6');
    const canopy = page.getByRole('textbox', { name: /^Canopy area/ });
    await canopy.fill('1.1 m²');
    await canopy.press('Tab');
    await page.getByRole('button', { name: 'Winds from a file (CSV or text)' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Wind file').setInputFiles({
      name: 'sounding.txt',
      mimeType: 'text/plain',
      buffer: Buffer.from(WIND_FILE),
    });
    await dialog.getByRole('combobox', { name: 'Temperature column' }).click();
    await page.locator('.ant-select-item-option[title="4: temp_c"]').click();
    await expect
      .poll(() => dialog.getByText(/replace the standard atmosphere/).count())
      .toBeGreaterThan(0);
    await dialog.getByRole('button', { name: 'Use these 6 levels' }).click();
    await expect.poll(() => dialog.isVisible()).toBe(false);
    await expect
      .poll(() => page.getByRole('img', { name: /^Landing: [\d.,]+ km from launch/ }).count())
      .toBe(1);
    await page.getByRole('button', { name: 'Estimate landing area' }).click();
    await expect
      .poll(() => page.getByRole('img', { name: '95 % landing area' }).count(), { timeout: 60000 })
      .toBe(1);

    await page.getByRole('button', { name: 'Save as version 2' }).click();
    await expect.poll(async () => (await api(`/calculations/${flightId}`)).latestVersion).toBe(2);
    const flight = await api(`/calculations/${flightId}`);
    const sizing = await api(`/calculations/${sizingId}`);
    const flightInputs = flight.latest?.inputs ?? {};
    // Nothing was retyped: the payload is the sizing's, the burst diameter the library's.
    expect(flightInputs.payloadMassKg).toBe(sizing.latest?.inputs.payloadMassKg);
    expect((flightInputs.envelope as { burstDiameterM: number }).burstDiameterM).toBe(4);
    expect((flightInputs.wind as { layers: unknown[] }).layers).toHaveLength(6);

    // The fill card of the saved flight: the crew types the filler's own mass.
    await page.goto(`${product.baseUrl}/calculations/${flightId}/versions/2`);
    await page.getByRole('link', { name: 'Fill card of version 2' }).click();
    await page.getByRole('textbox', { name: 'Filler mass' }).fill('150 g');
    await page.getByRole('textbox', { name: 'Filler mass' }).press('Tab');
    await expect
      .poll(() => page.getByLabel('Weight to hang on the filler').first().textContent())
      .toMatch(/\d/);
    await expect.poll(() => page.getByRole('button', { name: 'Print the card' }).count()).toBe(1);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the PDF' }).click(),
    ]);
    const pdfPath = await download.path();
    const pdf = await readFile(pdfPath);
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const cardText = execFileSync('pdftotext', ['-layout', pdfPath, '-'], { encoding: 'utf8' });
    expect(cardText).toMatch(/Weight to hang on the filler/i);

    // Flight → rules check: the flight's payload becomes the package to check.
    await page.goto(`${product.baseUrl}/calculations/${flightId}`);
    await page.getByRole('button', { name: 'Continue as balloon rules check' }).click();
    await page.waitForURL((url) => !url.pathname.endsWith(flightId));
    const rules = await api(`/calculations/${calculationIdInUrl()}`);
    const packages = rules.latest?.inputs.packages as { massKg: number }[];
    expect(packages.map((item) => item.massKg)).toEqual([flightInputs.payloadMassKg]);
    expect(consoleErrors).toEqual([]);
    // A long walk through five pages, sized for a busy two-core machine.
  }, 240_000);
});
