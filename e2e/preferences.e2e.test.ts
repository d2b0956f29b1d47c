import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { mailedLinkPath } from './support/mailed-link.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

describe('account preferences in the browser', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let consoleErrors: string[];

  beforeAll(async () => {
    product = await startProduct();
    // A German browser writes 1.234,5: registration should guess comma-point from it.
    browser = await launchBrowser({ locale: 'de-DE' });
    page = await browser.context.newPage();
    consoleErrors = collectConsoleErrors(page);
  });

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  /** The account as the API has it, read with the page's own session. */
  async function storedPreferences() {
    const token = await page.evaluate(() => window.localStorage.getItem('loftwright.session'));
    const response = await page.request.get(`${product.baseUrl}/api/auth/me`, {
      headers: { Authorization: `Bearer ${token ?? ''}` },
    });
    expect(response.status()).toBe(200);
    const me = (await response.json()) as Record<string, unknown>;
    return { unitSystem: me.unitSystem, numberFormat: me.numberFormat, currency: me.currency };
  }

  /** The text an antd Select shows for its value, found by the Select's aria-label. */
  const shown = (label: string) =>
    page.locator('.ant-select', { has: page.getByRole('combobox', { name: label }) }).textContent();

  async function choose(label: string, option: RegExp) {
    await page.getByRole('combobox', { name: label }).click();
    const saved = page.waitForResponse(
      (response) =>
        response.url().endsWith('/api/auth/me/preferences') &&
        response.request().method() === 'PATCH',
    );
    await page.locator('.ant-select-item-option').filter({ hasText: option }).click();
    expect((await saved).status()).toBe(200);
  }

  it('registers with the number format the browser writes, and EUR', async () => {
    screenshotOnFailure(() => page, 'preferences-register');
    await page.goto(`${product.baseUrl}/register`);
    await page.getByLabel('Name').fill('Greta Vogel');
    await page.getByLabel('E-mail').fill('greta@example.test');
    await page.getByLabel('Password').fill('a-long-password-1');
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect.poll(() => page.getByText('Check your mail').isVisible()).toBe(true);
    const link = await mailedLinkPath(product, 'greta@example.test', '/confirm-account');
    await page.goto(`${product.baseUrl}${link}`);
    await expect.poll(() => page.url()).toBe(`${product.baseUrl}/calculations`);
    expect(await storedPreferences()).toEqual({
      unitSystem: 'si',
      numberFormat: 'comma-point',
      currency: 'EUR',
    });
    await expect.poll(() => shown('Number format')).toBe('1.234,5');
    expect(await shown('Currency')).toBe('EUR');
  });

  it('changes the number format and currency from the user menu, and keeps them', async () => {
    screenshotOnFailure(() => page, 'preferences-change');
    await choose('Number format', /^1\s234,5$/);
    await choose('Currency', /^CHF$/);
    expect(await storedPreferences()).toEqual({
      unitSystem: 'si',
      numberFormat: 'comma-space',
      currency: 'CHF',
    });
    await page.reload();
    await expect
      .poll(async () => (await shown('Number format'))?.replace(/\s/g, ' '))
      .toBe('1 234,5');
    expect(await shown('Currency')).toBe('CHF');
    expect(consoleErrors).toEqual([]);
  });
});
