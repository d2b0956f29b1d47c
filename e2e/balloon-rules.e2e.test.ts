import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';

// Exact definitions (NIST SP 811, Appendix B): 1 lb = 0.453 592 37 kg, 1 in = 0.0254 m.
const LB_KG = 0.45359237;
const IN2_M2 = 0.0254 ** 2;

interface Version {
  number: number;
  inputs: {
    profileId: string;
    packages: { massKg: number; smallestSurfaceAreaM2?: number }[];
  };
  outputs: Record<string, { value: number }>;
  warnings: { code: string }[];
}

describe('a balloon rules check, its payload packages typed as rows', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let consoleErrors: string[];

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

  const row = (name: string) => page.getByRole('group', { name, exact: true });
  const mass = (name: string) => row(name).getByLabel(/^Mass of the package/i);
  const area = (name: string) => row(name).getByLabel(/^Area of its smallest surface/i);
  const crossed = () =>
    page
      .locator('[data-warning^="rule-crossed-"]')
      .evaluateAll((elements) => elements.map((element) => element.getAttribute('data-warning')));
  const thresholdsCrossed = () =>
    page.locator('[data-output="thresholdsCrossed"]').textContent({ timeout: 15_000 });

  async function latestVersion(id: string): Promise<Version> {
    const token = await page.evaluate(() => localStorage.getItem('loftwright.session'));
    const response = await page.request.get(`${product.baseUrl}/api/calculations/${id}`, {
      headers: { authorization: `Bearer ${token ?? ''}` },
    });
    return ((await response.json()) as { latest: Version }).latest;
  }

  it('creates the check, adds two packages, removes one, saves and sees the rules result', async () => {
    screenshotOnFailure(() => page, 'balloon-rules-rows');
    await page.getByRole('button', { name: 'New calculation' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Kind').click();
    // The kinds list is virtual: scroll to its end, where the rules check is.
    const option = page.locator('.ant-select-item-option', { hasText: /^Balloon rules check$/ });
    await page.locator('.ant-select-dropdown').hover();
    await expect
      .poll(async () => {
        await page.mouse.wheel(0, 200);
        return option.count();
      })
      .toBe(1);
    await option.click();
    await dialog.getByLabel('Title').fill('Radiosonde train rules');
    await dialog.getByRole('button', { name: 'Create' }).click();
    await expect.poll(() => page.url()).toMatch(/\/calculations\/[0-9a-f-]{36}$/);
    const id = page.url().split('/').at(-1) ?? '';

    // The kind's example: one light package, under every threshold; the jurisdiction by title.
    await expect.poll(() => thresholdsCrossed()).toMatch(/crossed\s*0/i);
    const jurisdiction = page.locator('.ant-select', { has: page.locator('#field-profileId') });
    expect(await jurisdiction.textContent()).toContain('United States (FAA, 14 CFR Part 101)');
    expect(await page.getByText('A list, written as JSON').count()).toBe(0);
    expect(await mass('Package 1').inputValue()).toBe('1.2 kg');

    await page.getByRole('button', { name: 'Add package' }).click();
    await mass('Package 2').fill('7 lb');
    await area('Package 2').fill('100 in²');
    await page.getByRole('button', { name: 'Add package' }).click();
    await mass('Package 3').fill('2 kg');
    await area('Package 3').fill('0.1 m²');
    // 14 CFR 101.1(a)(4): 7 lb is over (ii)'s 6 lb; 1.12 oz/in² stays under (i)'s 3 oz/in²; the
    // three together, 1.2 kg + 3.175 kg + 2 kg = 6.375 kg, are over (iii)'s 12 lb (5.443 kg).
    await expect
      .poll(() => crossed())
      .toEqual([
        'rule-crossed-101.1(a)(4)(ii)-single-package-mass',
        'rule-crossed-101.1(a)(4)(iii)-combined-package-mass',
      ]);
    expect(await thresholdsCrossed()).toMatch(/crossed\s*2/i);

    await page.getByRole('button', { name: 'Remove package 1' }).click();
    // 3.175 kg + 2 kg = 5.175 kg: no longer over 12 lb together.
    await expect
      .poll(() => crossed())
      .toEqual(['rule-crossed-101.1(a)(4)(ii)-single-package-mass']);
    expect(await row('Package 3').count()).toBe(0);
    expect(await mass('Package 1').inputValue()).toBe('7 lb');
    expect(await area('Package 1').inputValue()).toBe('100 in²');
    expect(await mass('Package 2').inputValue()).toBe('2 kg');

    await page.getByLabel('Change note').fill('Radio and sensor pods, no ballast pack');
    await page.getByRole('button', { name: 'Save as version 2' }).click();
    await expect.poll(() => page.getByText('Saved as version 2.').isVisible()).toBe(true);

    const latest = await latestVersion(id);
    expect(latest.number).toBe(2);
    expect(latest.inputs.profileId).toBe('us-14cfr101');
    expect(latest.inputs.packages).toHaveLength(2);
    expect(latest.inputs.packages[0]?.massKg).toBeCloseTo(7 * LB_KG, 9);
    expect(latest.inputs.packages[0]?.smallestSurfaceAreaM2).toBeCloseTo(100 * IN2_M2, 12);
    expect(latest.inputs.packages[1]).toEqual({ massKg: 2, smallestSurfaceAreaM2: 0.1 });
    // The server recomputed the same verdict.
    expect(latest.outputs.thresholdsCrossed?.value).toBe(1);
    expect(latest.warnings.map((warning) => warning.code)).toContain(
      'rule-crossed-101.1(a)(4)(ii)-single-package-mass',
    );

    // After a reload: the saved rows and the rules result.
    await page.reload();
    await expect.poll(() => thresholdsCrossed()).toMatch(/crossed\s*1/i);
    await expect
      .poll(() => crossed())
      .toEqual(['rule-crossed-101.1(a)(4)(ii)-single-package-mass']);
    expect(
      await page
        .locator('[data-warning="rule-crossed-101.1(a)(4)(ii)-single-package-mass"]')
        .textContent(),
    ).toMatch(/more than 6 lb/);
    expect(await row('Package 2').isVisible()).toBe(true);
    expect(await row('Package 3').count()).toBe(0);
    expect(await mass('Package 2').inputValue()).toBe('2 kg');
  });

  it('logged no console errors', () => {
    expect(consoleErrors).toEqual([]);
  });
});
