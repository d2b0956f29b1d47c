import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';

const FIRST_INPUTS = {
  envelope: { shape: 'sphere', diameterM: 1.2 },
  envelopeMass: { kind: 'fixed', massKg: 0.2 },
  payloadMassKg: 0.4,
  gas: { gasId: 'helium' },
  ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
};

interface Version {
  number: number;
  note: string;
  inputs: typeof FIRST_INPUTS;
}

describe('a designer’s editor and list: stale saves, unsaved changes, units, quick actions', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let consoleErrors: string[];
  let token = '';
  let calculationId = '';

  /** A save from somewhere else (another tab, a colleague): straight to the API. */
  async function saveElsewhere(baseVersion: number, payloadMassKg: number, note: string) {
    const response = await page.request.post(
      `${product.baseUrl}/api/calculations/${calculationId}/versions`,
      {
        headers: { authorization: `Bearer ${token}` },
        data: { baseVersion, inputs: { ...FIRST_INPUTS, payloadMassKg }, note },
      },
    );
    expect(response.status()).toBe(201);
  }

  async function latestVersion(): Promise<Version> {
    const response = await page.request.get(
      `${product.baseUrl}/api/calculations/${calculationId}`,
      { headers: { authorization: `Bearer ${token}` } },
    );
    return ((await response.json()) as { latest: Version }).latest;
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
    const created = await page.request.post(`${product.baseUrl}/api/calculations`, {
      headers: { authorization: `Bearer ${token}` },
      data: { title: 'Conflict check sphere', kind: 'lift-check', inputs: FIRST_INPUTS },
    });
    if (created.status() !== 201) throw new Error(`Create failed: ${await created.text()}`);
    calculationId = ((await created.json()) as { id: string }).id;
  });

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  const diameter = () => page.getByLabel('Diameter', { exact: true });
  const dialog = () => page.getByRole('dialog');

  it('shows both versions on a stale save and keeps the typed inputs as a new version', async () => {
    screenshotOnFailure(() => page, 'conflict-keep-mine');
    await page.goto(`${product.baseUrl}/calculations/${calculationId}`);
    await diameter().fill('2 m');
    await page.getByLabel('Change note').fill('Two-metre envelope for the heavier pod');
    await saveElsewhere(1, 0.55, 'Payload weighed again');

    await page.getByRole('button', { name: 'Save as version 2' }).click();
    await expect
      .poll(() => dialog().getByText('Someone saved a newer version').isVisible())
      .toBe(true);
    // Their change and mine, side by side, by input.
    await expect
      .poll(() =>
        dialog().getByRole('columnheader', { name: 'Theirs (version 2)' }).first().isVisible(),
      )
      .toBe(true);
    // By the label the editor shows, each row in one unit, never the internal path.
    const diameterRow = dialog().getByRole('row', { name: /^Diameter/ });
    expect(await diameterRow.textContent()).toMatch(/1\.2 m.*2 m/);
    const payloadRow = dialog().getByRole('row', { name: /^Payload hanging below the envelope/ });
    expect(await payloadRow.textContent()).toMatch(/550 g.*400 g/);
    expect(await dialog().innerText()).not.toMatch(/diameterM|payloadMassKg/);
    expect(await dialog().getByText('“Payload weighed again”', { exact: false }).isVisible()).toBe(
      true,
    );

    // Nothing typed is lost while the dialog is open.
    expect(await diameter().inputValue()).toBe('2 m');
    expect(await page.getByLabel('Change note').inputValue()).toBe(
      'Two-metre envelope for the heavier pod',
    );

    await dialog().getByRole('button', { name: 'Keep mine as version 3' }).click();
    await expect.poll(() => page.getByText('Saved as version 3.').isVisible()).toBe(true);
    const latest = await latestVersion();
    expect(latest.number).toBe(3);
    expect(latest.inputs.envelope.diameterM).toBe(2);
    expect(latest.note).toBe('Two-metre envelope for the heavier pod');
  });

  it('takes the other version when asked, and then has nothing unsaved', async () => {
    screenshotOnFailure(() => page, 'conflict-take-theirs');
    await diameter().fill('250 cm');
    await saveElsewhere(3, 0.6, 'Heavier radio');
    await page.getByRole('button', { name: 'Save as version 4' }).click();
    await dialog().getByRole('button', { name: 'Take version 4' }).click();
    await expect.poll(() => dialog().isVisible()).toBe(false);
    await expect.poll(() => diameter().inputValue()).toBe('1.2 m');
    await expect
      .poll(() => page.getByRole('button', { name: 'Submit version 4 for review' }).isVisible())
      .toBe(true);
    expect((await latestVersion()).inputs.payloadMassKg).toBe(0.6);
  });

  it('warns before leaving with unsaved changes, and stays when asked', async () => {
    screenshotOnFailure(() => page, 'unsaved-leave');
    await diameter().fill('1.8 m');
    await page.getByRole('menuitem', { name: 'Calculations' }).click();
    await expect.poll(() => dialog().getByText('Leave without saving?').isVisible()).toBe(true);
    await dialog().getByRole('button', { name: 'Stay' }).click();
    expect(page.url()).toBe(`${product.baseUrl}/calculations/${calculationId}`);
    expect(await diameter().inputValue()).toBe('1.8 m');

    await page.getByRole('menuitem', { name: 'Calculations' }).click();
    await dialog().getByRole('button', { name: 'Leave' }).click();
    await expect.poll(() => page.url()).toBe(`${product.baseUrl}/calculations`);
  });

  it('shows what a field read and every result in US units after the switch, and remembers it', async () => {
    screenshotOnFailure(() => page, 'unit-switch');
    await page.goto(`${product.baseUrl}/calculations/${calculationId}`);
    await page.getByText('US', { exact: true }).click();
    await expect
      .poll(() => page.locator('[data-output="freeLift"]').textContent())
      .toMatch(/\d (lb|oz)/);
    // Remembered on the account: still US after a reload.
    await page.reload();
    await expect
      .poll(() => page.locator('[data-output="netLift"]').textContent())
      .toMatch(/\d (lb|oz)/);
    await diameter().fill('4 ft');
    // 4 ft = 1.2192 m exactly (international foot, NIST SP 811 appendix B).
    await expect.poll(() => page.getByText(/^read as 4 ft/).isVisible()).toBe(true);
    await page.getByText('SI', { exact: true }).click();
    await expect.poll(() => page.getByText(/^read as 1\.2192 m/).isVisible()).toBe(true);
    await expect
      .poll(() => page.locator('[data-output="netLift"]').textContent())
      .toMatch(/\d (kg|g)/);
  });

  it('duplicates a calculation from the list and archives the copy', async () => {
    screenshotOnFailure(() => page, 'list-quick-actions');
    await page.goto(`${product.baseUrl}/calculations`);
    await page.getByRole('button', { name: 'Duplicate Conflict check sphere' }).click();
    await expect
      .poll(() => page.getByRole('heading', { name: 'Conflict check sphere (copy)' }).isVisible())
      .toBe(true);
    expect(page.url()).not.toContain(calculationId);

    await page.getByRole('menuitem', { name: 'Calculations' }).click();
    await page.getByRole('button', { name: 'Archive Conflict check sphere (copy)' }).click();
    await page.getByRole('tooltip').getByRole('button', { name: 'Archive' }).click();
    await expect
      .poll(() => page.getByText('Archived “Conflict check sphere (copy)”.').isVisible())
      .toBe(true);
    await expect
      .poll(() => page.getByRole('link', { name: 'Conflict check sphere (copy)' }).count())
      .toBe(0);
    expect(
      await page.getByRole('link', { name: 'Conflict check sphere', exact: true }).count(),
    ).toBe(1);
  });

  it('exports a calculation to a file and imports it back as a new one', async () => {
    screenshotOnFailure(() => page, 'export-import');
    await page.goto(`${product.baseUrl}/calculations/${calculationId}`);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export file' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe('Conflict-check-sphere.loftwright.json');
    const path = await download.path();
    const file = JSON.parse(readFileSync(path, 'utf8')) as { versions: unknown[] };
    expect(file.versions.length).toBe((await latestVersion()).number);

    await page.goto(`${product.baseUrl}/calculations`);
    await page.getByLabel('Loftwright file to import').setInputFiles({
      name: 'sphere.loftwright.json',
      mimeType: 'application/json',
      buffer: readFileSync(path),
    });
    await expect
      .poll(() =>
        page.getByText(/^Imported “Conflict check sphere” with \d+ versions\.$/).isVisible(),
      )
      .toBe(true);
    await expect.poll(() => page.url()).toMatch(/\/calculations\/[0-9a-f-]{36}$/);
    expect(page.url()).not.toContain(calculationId);
  });

  it('says why a file that is not a Loftwright file cannot be imported', async () => {
    screenshotOnFailure(() => page, 'import-refused');
    await page.goto(`${product.baseUrl}/calculations`);
    await page.getByLabel('Loftwright file to import').setInputFiles({
      name: 'other.json',
      mimeType: 'application/json',
      buffer: Buffer.from(JSON.stringify({ format: 'someone-else', formatVersion: 1 })),
    });
    await expect
      .poll(() =>
        page
          .getByText(/other\.json could not be imported.*not a Loftwright calculation file/)
          .isVisible(),
      )
      .toBe(true);
  });

  it('logged no console errors', () => {
    expect(consoleErrors).toEqual([]);
  });
});
