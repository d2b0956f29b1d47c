import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';
// A 1×1 PNG.
const PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);
const LOGGER_CSV = 'time_s,scale_kg,air_c\n0,0.210,14.5\n3600,0.214,14.1\n7200,0.219,13.8\n';

describe('field records in the browser: files, fill logs and reading imports', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let consoleErrors: string[];
  let calculationUrl = '';

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
  });

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  const files = () => page.getByRole('table', { name: 'Files' });
  const chooseFile = (name: string, mimeType: string, buffer: Buffer) =>
    page.locator('input[type=file]').first().setInputFiles({ name, mimeType, buffer });

  it('uploads a photo and a logger CSV, and previews the CSV as a table', async () => {
    screenshotOnFailure(() => page, 'attachments-upload');
    await page.getByRole('link', { name: /^Shore anemometer/ }).click();
    await page.waitForURL(/\/calculations\/[0-9a-f-]{36}$/);
    calculationUrl = page.url();
    // The drop zone is ready once the (empty) file list has loaded.
    await expect.poll(() => files().getByText('No files yet').isVisible()).toBe(true);

    await chooseFile('rig-photo.png', 'image/png', PNG);
    await expect.poll(() => page.getByText('Added rig-photo.png.').isVisible()).toBe(true);
    await chooseFile('logger.csv', 'text/csv', Buffer.from(LOGGER_CSV));
    await expect
      .poll(() => files().getByRole('button', { name: 'logger.csv', exact: true }).isVisible())
      .toBe(true);
    expect(
      await files()
        .getByRole('row', { name: /rig-photo\.png/ })
        .textContent(),
    ).toContain('PNG image');

    await files().getByRole('button', { name: 'logger.csv', exact: true }).click();
    const preview = page.getByRole('table', { name: 'File contents' });
    await expect
      .poll(() => preview.getByRole('columnheader', { name: 'scale_kg' }).isVisible())
      .toBe(true);
    expect(await preview.getByRole('row').count()).toBe(4);
    await page.keyboard.press('Escape');

    await files().getByRole('button', { name: 'rig-photo.png', exact: true }).click();
    await expect
      .poll(() => page.getByRole('img', { name: 'rig-photo.png' }).isVisible())
      .toBe(true);
    await page.keyboard.press('Escape');
  });

  it('refuses a program dressed up as a photo and says why', async () => {
    screenshotOnFailure(() => page, 'attachments-refused');
    const exe = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(62, 0), Buffer.from('PE\0\0')]);
    await chooseFile('holiday.png', 'image/png', exe);
    await expect
      .poll(() => page.getByText(/holiday\.png: file is application\/x-msdownload/).isVisible())
      .toBe(true);
    expect(await files().getByRole('button', { name: 'holiday.png', exact: true }).count()).toBe(0);
  });

  it('removes a file after asking', async () => {
    screenshotOnFailure(() => page, 'attachments-remove');
    await page.goto(calculationUrl);
    await files().getByRole('button', { name: 'Remove rig-photo.png' }).click();
    await page.getByRole('tooltip').getByRole('button', { name: 'Remove' }).click();
    await expect.poll(() => page.getByText('Removed rig-photo.png.').isVisible()).toBe(true);
    await expect
      .poll(() => files().getByRole('button', { name: 'rig-photo.png', exact: true }).count())
      .toBe(0);
  });

  it('logs a fill with a ballast reading and sees measured against predicted lift', async () => {
    screenshotOnFailure(() => page, 'fill-log-create');
    await page.goto(calculationUrl);
    await page.getByRole('button', { name: 'Log a fill' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Place').fill('North hut');
    await dialog.getByLabel('Envelope', { exact: true }).fill('Capsule B');
    await dialog.getByLabel('Air temperature', { exact: true }).fill('11 degC');
    await dialog.getByLabel('Air pressure (absolute)', { exact: true }).fill('1008 hPa');
    await dialog.getByLabel('Reading 1 ballast mass').fill('3 kg');
    await dialog.getByLabel('Reading 1 scale reading').fill('1.05 kg');
    await dialog.getByRole('button', { name: 'Save fill log' }).click();
    await expect.poll(() => dialog.isVisible()).toBe(false);

    const log = page.getByRole('region', { name: /^Fill log of / });
    // Measured: 3 kg − 1.05 kg = 1.95 kg, computed by the server.
    await expect
      .poll(() => log.locator('[data-output="measuredNetLift"]').textContent())
      .toContain('1.950 kg');
    expect(await log.locator('[data-output="predictedNetLift"]').textContent()).toMatch(
      /Predicted net lift at the logged conditions[\d.]+ kg/,
    );
    expect(
      await log
        .getByRole('img', { name: /^Measured and predicted net lift over 1 readings/ })
        .isVisible(),
    ).toBe(true);
  });

  it('imports readings from a CSV, listing the bad row by its line before storing anything', async () => {
    screenshotOnFailure(() => page, 'fill-log-import');
    const log = page.getByRole('region', { name: /^Fill log of / });
    await log.getByRole('button', { name: 'Import readings from CSV' }).click();
    const dialog = page.getByRole('dialog', { name: 'Import lift readings from a CSV file' });
    const csv = 'hours,scale_kg,air_c\n2,1.07,10.5\n4,heavy,10.1\n6,1.11,9.8\n';
    await dialog
      .getByLabel('CSV file')
      .setInputFiles({ name: 'logger.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await dialog.getByRole('combobox', { name: 'Time unit' }).click();
    // antd draws its options outside the listbox it exposes; pick the visible one by its title.
    await page.locator('.ant-select-item-option[title="h"]:visible').click();
    const check = dialog.getByRole('status', { name: 'Import check' });
    await expect
      .poll(() => check.textContent())
      .toContain('2 readings ready, 1 row cannot be read');
    expect(await check.textContent()).toMatch(/Line 3: Scale reading does not start with a number/);
    // Nothing stored yet.
    expect(await log.getByRole('table', { name: 'Lift readings' }).getByRole('row').count()).toBe(
      2,
    );

    await dialog.getByRole('button', { name: 'Import 2 readings, leave out 1 bad row' }).click();
    await expect.poll(() => dialog.isVisible()).toBe(false);
    await expect
      .poll(() => log.getByRole('table', { name: 'Lift readings' }).getByRole('row').count())
      .toBe(4);
    await expect
      .poll(() => log.getByRole('img', { name: /over 3 readings/ }).isVisible())
      .toBe(true);
    expect(await log.locator('[data-output="lossRate"]').count()).toBe(1);
  });

  it('exports the fill logs and the calculations table as files', async () => {
    screenshotOnFailure(() => page, 'table-exports');
    const [fillLogs] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export the fill logs as CSV' }).click(),
    ]);
    expect(fillLogs.suggestedFilename()).toBe('loftwright-fill-logs.csv');
    const csv = readFileSync(await fillLogs.path(), 'utf8');
    expect(csv).toContain('Measured net lift (kg)');
    expect(csv).toContain('North hut');

    await page.getByRole('menuitem', { name: 'Calculations' }).click();
    await page.getByRole('button', { name: 'Other formats for the calculations' }).click();
    const [workbook] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('menuitem', { name: 'Excel workbook (XLSX)' }).click(),
    ]);
    expect(workbook.suggestedFilename()).toBe('loftwright-calculations.xlsx');
    // An XLSX file is a ZIP archive.
    expect(
      readFileSync(await workbook.path())
        .subarray(0, 2)
        .toString(),
    ).toBe('PK');
  });

  it('plans the gas for a launch weekend from a saved calculation and an entered volume', async () => {
    screenshotOnFailure(() => page, 'gas-plan');
    await page.getByRole('menuitem', { name: 'Gas plans' }).click();
    await page.getByRole('button', { name: 'New gas plan' }).click();
    await page.waitForURL(/\/plans\/[0-9a-f-]{36}$/);

    await page.getByRole('combobox', { name: 'Envelope 1 from' }).click();
    await page.locator('.ant-select-item-option[title^="Shore anemometer"]:visible').click();
    await page.getByLabel('Envelope 1 count').fill('3');
    await page.getByRole('button', { name: 'Add an envelope' }).click();
    await page.getByLabel('Envelope 2 gas per envelope').fill('500 L');
    await page.getByLabel('Envelope 2 count').fill('4');
    await page.getByRole('switch', { name: 'Gas cylinders' }).click();
    await page.getByLabel('One full cylinder', { exact: true }).fill('320');
    await page.getByLabel('Delivered gas, per normal m³', { exact: true }).fill('40');
    await page.getByRole('button', { name: 'Save and compute' }).click();
    await expect
      .poll(() => page.getByText("Saved; the figures below are the server's.").isVisible())
      .toBe(true);

    const lines = page.getByRole('table', { name: 'Plan lines' });
    expect(await lines.getByRole('row', { name: /Shore anemometer/ }).textContent()).toMatch(/3/);
    // 4 × 0.5 m³ = 2 m³ for the entered line.
    expect(await lines.getByRole('row', { name: /Envelope 2/ }).textContent()).toContain(
      '2.000 m³',
    );
    await expect
      .poll(() =>
        page
          .getByRole('img', {
            name: /^Cost of the plan by source: Cylinders [\d.]+ EUR; Delivered gas [\d.]+ EUR$/,
          })
          .isVisible(),
      )
      .toBe(true);
    expect(await page.locator('[data-warning="pressurised-cylinder"]').count()).toBe(1);

    // A third envelope given by its diameter; a diameter that does not read stops the save.
    await page.getByRole('button', { name: 'Add an envelope' }).click();
    await page.getByRole('combobox', { name: 'Envelope 3 from' }).click();
    await page
      .locator('.ant-select-item-option[title="A sphere of a diameter I enter"]:visible')
      .click();
    await page.getByLabel('Envelope 3 diameter').fill('big');
    await expect
      .poll(() => page.getByRole('button', { name: 'Save and compute' }).isDisabled())
      .toBe(true);
    await page.getByLabel('Envelope 3 diameter').fill('2 m');
    await page.getByRole('button', { name: 'Save and compute' }).click();
    // π·(2 m)³/6 = 4.189 m³ (sphere volume, CRC Standard Mathematical Tables).
    await expect
      .poll(() => lines.getByRole('row', { name: /Sphere of 2 m/ }).textContent())
      .toContain('4.189 m³');
  });

  it('turns an energy-meter CSV into the metered energy of a gas supply', async () => {
    screenshotOnFailure(() => page, 'meter-import');
    await page.getByRole('menuitem', { name: 'Calculations' }).click();
    await page.getByRole('link', { name: /^Bench electrolyser/ }).click();
    await page.waitForURL(/\/calculations\/[0-9a-f-]{36}$/);
    await page.getByRole('button', { name: 'Energy from a meter log (CSV)' }).click();
    const dialog = page.getByRole('dialog', { name: 'Energy used, from an energy-meter CSV' });
    const choose = (csv: string) =>
      dialog
        .getByLabel('Meter CSV file')
        .setInputFiles({ name: 'meter.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });

    await choose('seconds,watts\n0,1200\n600,oops\n1800,1200\n');
    const check = dialog.getByRole('status', { name: 'Meter check' });
    await expect
      .poll(() => check.textContent())
      .toMatch(/Line 3: Power does not start with a number/);
    expect(await dialog.getByRole('button', { name: 'Use this energy' }).isDisabled()).toBe(true);

    // 1200 W for 1800 s = 2.16 MJ = 600 Wh.
    await choose('seconds,watts\n0,1200\n600,1200\n1800,1200\n');
    await expect.poll(() => check.textContent()).toContain('Energy used: 600.0 Wh');
    await dialog.getByRole('button', { name: 'Use this energy' }).click();
    await expect.poll(() => page.locator('[data-output="measuredSpecificEnergy"]').count()).toBe(1);
    await expect
      .poll(() => page.getByRole('status', { name: 'Results (live, not saved)' }).isVisible())
      .toBe(true);
  });

  it('logged no console errors', () => {
    expect(consoleErrors).toEqual([]);
  });
});
