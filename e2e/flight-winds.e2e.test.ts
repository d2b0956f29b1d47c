import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';

/** The flight-profile kind's example, launched from a site at 52° N 0° E. */
const FLIGHT_INPUTS = {
  envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 },
  envelopeMassKg: 0.6,
  payloadMassKg: 0.9,
  gas: { gasId: 'helium' },
  launch: { altitudeM: 120, latitudeDeg: 52, longitudeDeg: 0 },
  parachute: { areaM2: 0.8 },
  landingArea: { runs: 40, seed: 3 },
};

/** A forecast export: westerly winds in knots, one unreadable speed on line 4. */
const WIND_FILE = [
  'height_m,direction_deg,speed_kn',
  '0,270,10',
  '5000,265,30',
  '9000,270,n/a',
  '12000,275,60',
  '35000,270,20',
].join('\n');

describe('a designer brings launch-day winds into a flight profile', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let consoleErrors: string[];
  let calculationId = '';

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
    const token = (await page.evaluate(() => localStorage.getItem('loftwright.session'))) ?? '';
    const created = await page.request.post(`${product.baseUrl}/api/calculations`, {
      headers: { authorization: `Bearer ${token}` },
      data: { title: 'Launch-day drift', kind: 'flight-profile', inputs: FLIGHT_INPUTS },
    });
    if (created.status() !== 201) throw new Error(`Create failed: ${await created.text()}`);
    calculationId = ((await created.json()) as { id: string }).id;
  });

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  it('imports a wind file, sees the landing distance and draws the 95 % landing area', async () => {
    screenshotOnFailure(() => page, 'flight-winds');
    await page.goto(`${product.baseUrl}/calculations/${calculationId}`);
    await page.getByRole('button', { name: 'Winds from a file (CSV or text)' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Wind file').setInputFiles({
      name: 'winds.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(WIND_FILE),
    });
    await dialog.getByRole('combobox', { name: 'Speed unit' }).click();
    await page.locator('.ant-select-item-option[title="kn"]').click();
    await expect
      .poll(() => dialog.getByLabel('Lines left out').textContent())
      .toMatch(/^Line 4: speed/);
    await dialog.getByRole('button', { name: 'Use these 4 levels' }).click();
    await expect.poll(() => dialog.isVisible()).toBe(false);

    // The engine's landing distance in the results, and the landing marked on the track.
    await expect
      .poll(() => page.getByText('Ground distance to landing').first().isVisible())
      .toBe(true);
    const landing = page.getByRole('img', {
      name: /^Landing: [\d.,]+ km from launch, bearing \d+°$/,
    });
    await expect.poll(() => landing.count()).toBe(1);

    await page.getByRole('button', { name: 'Estimate landing area' }).click();
    await expect
      .poll(() => page.getByRole('img', { name: '95 % landing area' }).count(), { timeout: 45000 })
      .toBe(1);
    await expect.poll(() => page.getByText(/^Landing area from \d+ runs/).count()).toBe(1);
    expect(consoleErrors).toEqual([]);
  });
});
