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

describe('field records in the browser: files kept with a calculation', () => {
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

  it('logged no console errors', () => {
    expect(consoleErrors).toEqual([]);
  });
});
