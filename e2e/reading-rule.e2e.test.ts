import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';

const LIFT_INPUTS = {
  envelope: { shape: 'sphere', diameterM: 1.2 },
  envelopeMass: { kind: 'fixed', massKg: 0.2 },
  payloadMassKg: 0.4,
  gas: { gasId: 'hydrogen', purity: 0.99 },
  ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
};

const SUPPLY_INPUTS = {
  fill: { volumeM3: 0.5, temperatureK: 288.15, pressurePa: 101325, count: 1 },
  measured: { energyJ: 3.6e6, volumeM3: 0.5 },
  prices: { currency: 'EUR', electricityPerKWh: 0.3 },
};

describe('typed values are read as meant, in every number format', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let consoleErrors: string[];
  let token = '';
  const ids: Record<string, string> = {};

  const api = (path: string) => `${product.baseUrl}/api${path}`;
  const auth = () => ({ authorization: `Bearer ${token}` });

  async function create(title: string, kind: string, inputs: unknown) {
    const created = await page.request.post(api('/calculations'), {
      headers: auth(),
      data: { title, kind, inputs },
    });
    if (created.status() !== 201) throw new Error(`Create failed: ${await created.text()}`);
    return ((await created.json()) as { id: string }).id;
  }

  async function latestInputs(id: string): Promise<Record<string, Record<string, unknown>>> {
    const response = await page.request.get(api(`/calculations/${id}`), { headers: auth() });
    return ((await response.json()) as { latest: { inputs: Record<string, never> } }).latest.inputs;
  }

  async function useNumberFormat(numberFormat: string) {
    const response = await page.request.patch(api('/auth/me/preferences'), {
      headers: auth(),
      data: { numberFormat },
    });
    expect(response.status()).toBe(200);
  }

  async function openEditor(id: string) {
    await page.goto(`${product.baseUrl}/calculations/${id}`);
    await page.getByRole('heading', { name: 'Inputs', exact: true }).waitFor();
  }

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
    ids.lift = await create('Reading rule sphere', 'lift-check', LIFT_INPUTS);
    ids.supply = await create('Reading rule supply', 'gas-supply', SUPPLY_INPUTS);
  });

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  const price = () => page.getByLabel('Electricity price (optional)', { exact: true });
  const saveButton = () => page.getByRole('button', { name: /^Save as version/ });

  it.each([
    ['point-comma', '0.25 EUR/kWh'],
    ['comma-space', '0,25 EUR/kWh'],
  ])('reads "0,25" as a price of 0.25 in %s format', async (numberFormat, readAs) => {
    screenshotOnFailure(() => page, 'reading-rule-1');
    await useNumberFormat(numberFormat);
    await openEditor(ids.supply ?? '');
    await price().fill('0,25');
    await page.getByText(`read as ${readAs}`).waitFor();
    await saveButton().click();
    await page.getByText(/^Saved as version/).waitFor();
    expect((await latestInputs(ids.supply ?? '')).prices?.electricityPerKWh).toBe(0.25);
    // Put another price back so the next format's save is a change.
    await page.request.post(api(`/calculations/${ids.supply}/versions`), {
      headers: auth(),
      data: {
        baseVersion: numberFormat === 'point-comma' ? 2 : 3,
        inputs: SUPPLY_INPUTS,
        note: 'price reset',
      },
    });
  });

  it('keeps a price it cannot read, says why, and holds back results and saving', async () => {
    screenshotOnFailure(() => page, 'reading-rule-2');
    await useNumberFormat('point-comma');
    await openEditor(ids.supply ?? '');
    await price().fill('abc');
    await expect(price().inputValue()).resolves.toBe('abc');
    await page
      .getByText(/Electricity price \(optional\): “abc” does not start with a number/)
      .first()
      .waitFor();
    await page.getByText(/Results wait for: Electricity price/).waitFor();
    expect(await saveButton().isDisabled()).toBe(true);
    await price().fill('1,500');
    await page
      .getByText(/could be 1\.5 or 1500: type 1\.5 or 1500/)
      .first()
      .waitFor();
    expect(await saveButton().isDisabled()).toBe(true);
    await price().fill('0.32 EUR/kWh');
    await page.getByText('read as 0.32 EUR/kWh').waitFor();
    expect(await saveButton().isDisabled()).toBe(false);
  });

  it('reads a bare number in the unit the field last showed, not in metres', async () => {
    screenshotOnFailure(() => page, 'reading-rule-3');
    await openEditor(ids.lift ?? '');
    const diameter = page.getByLabel('Diameter', { exact: true });
    await diameter.fill('158 cm');
    await page.getByText('read as 158 cm (1.58 m)').waitFor();
    await diameter.fill('');
    await diameter.fill('150');
    await page.getByText('read as 150 cm (a number alone is in cm)').waitFor();
    await saveButton().click();
    await page.getByText(/^Saved as version/).waitFor();
    const saved = await latestInputs(ids.lift ?? '');
    expect(saved.envelope?.diameterM).toBeCloseTo(1.5, 12);
  });

  it('reads 98 and 1 in percentage fields as percent', async () => {
    screenshotOnFailure(() => page, 'reading-rule-4');
    await openEditor(ids.lift ?? '');
    const purity = page.getByLabel(/^Mole fraction of the named gas/);
    await purity.fill('98');
    await page.getByText('read as 98 % (a number alone is a percentage)').waitFor();
    const vapour = page.getByLabel(/^Water vapour in the gas/);
    await vapour.fill('1');
    await page.getByText('read as 1 % (a number alone is a percentage)').waitFor();
    await saveButton().click();
    await page.getByText(/^Saved as version/).waitFor();
    const saved = await latestInputs(ids.lift ?? '');
    expect(saved.gas?.purity).toBeCloseTo(0.98, 12);
    expect(saved.gas?.relativeHumidity).toBeCloseTo(0.01, 12);
  });

  it('notes a value the trade seldom meets before saving, keeps it and records the note', async () => {
    screenshotOnFailure(() => page, 'reading-rule-plausibility');
    await openEditor(ids.lift ?? '');
    await page.getByLabel('Diameter', { exact: true }).fill('120 m');
    const note = page.locator('[data-note="check-this"]');
    await expect
      .poll(() => note.textContent())
      .toMatch(/^Check this: Diameter is 120 m, above the usual 100 m/);
    await page.getByText(/^Check before saving: one value lies outside/).waitFor();
    // A note never blocks: the value is saved as typed, with the note.
    await saveButton().click();
    await page.getByText(/^Saved as version/).waitFor();
    const response = await page.request.get(api(`/calculations/${ids.lift ?? ''}`), {
      headers: auth(),
    });
    const latest = (
      (await response.json()) as {
        latest: { inputs: { envelope: { diameterM: number } }; warnings: { code: string }[] };
      }
    ).latest;
    expect(latest.inputs.envelope.diameterM).toBe(120);
    expect(latest.warnings.map((warning) => warning.code)).toContain('check-this');
  });

  it('shows results, derivation and charts in the person’s number format', async () => {
    screenshotOnFailure(() => page, 'reading-rule-display');
    await useNumberFormat('comma-space');
    await openEditor(ids.lift ?? '');
    // Air at 15 °C and 101 325 Pa is about 1.225 kg/m³ (U.S. Standard Atmosphere 1976, Table I).
    await expect
      .poll(() => page.locator('[data-output="airDensity"]').textContent())
      .toMatch(/1,22\d kg\/m³/);
    const derivation = page.getByRole('list', { name: 'Derivation steps' });
    expect(await derivation.textContent()).toContain('p = 101\u202f325 Pa');
    await useNumberFormat('point-comma');
    await page.reload();
    await expect
      .poll(() => page.locator('[data-output="airDensity"]').textContent())
      .toMatch(/1\.22\d kg\/m³/);
  });

  it('names a range in °C for a Celsius field', async () => {
    screenshotOnFailure(() => page, 'reading-rule-5');
    await openEditor(ids.lift ?? '');
    await page.getByLabel('Air temperature', { exact: true }).fill('500 °C');
    // The engine's air range, 173.15 K to 423.15 K, is −100 °C to 150 °C (°C = K − 273.15).
    await page.getByText('Air temperature must be between −100 °C and 150 °C').first().waitFor();
    // The engine's own check of the whole form follows the typing; wait for it.
    await expect.poll(() => saveButton().isDisabled()).toBe(true);
    expect(consoleErrors).toEqual([]);
  });
});
