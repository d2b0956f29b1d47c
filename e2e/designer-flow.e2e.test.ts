import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';

describe('designer, reviewer and student in the browser', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let consoleErrors: string[];

  beforeAll(async () => {
    product = await startProduct();
    browser = await launchBrowser();
    page = await browser.context.newPage();
    consoleErrors = collectConsoleErrors(page);
  });

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  async function signIn(email: string) {
    await page.goto(`${product.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect.poll(() => page.url()).toBe(`${product.baseUrl}/calculations`);
  }

  const netLift = () => page.locator('[data-output="netLift"]').textContent();
  let submittedUrl = '';
  /** The archived sign-off PDF as pdftotext reads it. */
  let sheetText = '';

  async function signOut() {
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect.poll(() => page.url()).toMatch(/\/sign-in/);
  }

  it('signs in and sees the team’s calculations', async () => {
    screenshotOnFailure(() => page, 'designer-sign-in');
    await signIn('designer@demo.test');
    await expect
      .poll(() => page.getByRole('link', { name: /^Curlew air-sampling pod/ }).isVisible())
      .toBe(true);
    // The session survives a reload.
    await page.reload();
    await expect
      .poll(() => page.getByRole('heading', { name: 'Calculations' }).isVisible())
      .toBe(true);
  });

  it('creates a lift check, types a size with its unit and sees the net lift change, then saves and submits', async () => {
    screenshotOnFailure(() => page, 'designer-create-save');
    await page.getByRole('button', { name: 'New calculation' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Title').fill('Browser check sphere');
    await dialog.getByRole('button', { name: 'Create' }).click();
    await expect.poll(() => page.url()).toMatch(/\/calculations\/[0-9a-f-]{36}$/);
    await expect.poll(() => netLift()).toMatch(/Net lift/);
    const before = await netLift();

    const diameter = page.getByLabel('Diameter', { exact: true });
    await diameter.fill('150 cm');
    await expect.poll(() => page.getByText(/read as 150 cm \(1\.5 m\)/).isVisible()).toBe(true);
    await expect.poll(() => netLift()).not.toBe(before);
    const after = await netLift();
    expect(after).toMatch(/Net lift/);

    await page.getByLabel('Change note').fill('Bigger envelope');
    await page.getByRole('button', { name: 'Save as version 2' }).click();
    await expect.poll(() => page.getByText('Saved as version 2.').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Submit version 2 for review' }).click();
    // A confirmation names the version and who reviews it; the demo reviewer is chosen by name.
    const confirm = page.getByRole('dialog', { name: 'Submit version 2 for review?' });
    await expect.poll(() => confirm.getByText(/goes to any reviewer/).isVisible()).toBe(true);
    await confirm.getByLabel('Reviewer').click();
    await page.locator('.ant-select-item-option').filter({ hasText: 'Ilse Varga' }).click();
    await confirm.getByRole('button', { name: 'Submit to Ilse Varga' }).click();
    await expect
      .poll(() => page.getByText('Version 2 is in review with Ilse Varga.').isVisible())
      .toBe(true);
    submittedUrl = page.url();
  });

  it('refuses a value of the wrong kind and says why, next to the field', async () => {
    screenshotOnFailure(() => page, 'designer-bad-unit');
    await page.getByRole('menuitem', { name: 'Calculations' }).click();
    await page.getByRole('button', { name: 'New calculation' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Title').fill('Unit check');
    await dialog.getByRole('button', { name: 'Create' }).click();
    await expect.poll(() => page.url()).toMatch(/\/calculations\/[0-9a-f-]{36}$/);
    await page.getByLabel('Diameter', { exact: true }).fill('5 kg');
    // Said beside the field, and again where the results say what holds them back.
    await expect.poll(() => page.getByText(/is not a length/).count()).toBe(2);
    await expect.poll(() => page.getByText(/^Results wait for: Diameter/).isVisible()).toBe(true);
  });

  it('lets a reviewer find it in the queue and approve it; the designer then sees it locked', async () => {
    screenshotOnFailure(() => page, 'reviewer-approve');
    await signOut();
    await signIn('reviewer@demo.test');
    await page.getByRole('menuitem', { name: 'Review queue' }).click();
    await page.getByRole('link', { name: 'Browser check sphere', exact: true }).click();
    await expect.poll(() => page.url()).toBe(submittedUrl);
    await page.getByLabel('Review comment').fill('Size checked against the envelope drawing.');
    await page.getByRole('button', { name: 'Approve' }).click();
    await expect.poll(() => page.getByText('Version 2 approved.').isVisible()).toBe(true);

    await signOut();
    await signIn('designer@demo.test');
    await page.goto(submittedUrl);
    await expect
      .poll(() => page.getByText('Version 2 is approved and locked.').isVisible())
      .toBe(true);
  });

  it('finds the sign-off PDF archived with the approval, and poppler renders its first page', async () => {
    screenshotOnFailure(() => page, 'archived-sign-off');
    const files = page.getByRole('table', { name: 'Files' });
    const row = files.getByRole('row', { name: /Sign-off sheet of version 2/ });
    await expect.poll(() => row.isVisible()).toBe(true);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      row.getByRole('button', { name: /^Download / }).click(),
    ]);
    const dir = mkdtempSync(join(tmpdir(), 'loftwright-sheet-'));
    try {
      const file = join(dir, download.suggestedFilename());
      await download.saveAs(file);
      expect(download.suggestedFilename()).toBe('Browser-check-sphere-v2-sign-off.pdf');
      execFileSync('pdftoppm', ['-png', '-r', '30', '-f', '1', '-l', '1', file, join(dir, 'page')]);
      expect(readFileSync(join(dir, 'page-1.png')).subarray(1, 4).toString()).toBe('PNG');
      sheetText = execFileSync('pdftotext', [file, '-']).toString();
      expect(sheetText).toContain('Size checked against the envelope drawing.');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('shows the web sheet in words and units, with the whole fingerprint, a verify URL and its QR code', async () => {
    screenshotOnFailure(() => page, 'web-sign-off-sheet');
    await page.goto(`${submittedUrl.replace(/\?.*$/, '')}/versions/2/sheet`);
    const sheet = page.getByRole('article', { name: 'Sign-off sheet' });
    await expect
      .poll(() => sheet.getByRole('heading', { name: 'Inputs', exact: true }).isVisible())
      .toBe(true);
    const text = await sheet.innerText();
    expect(text).not.toMatch(/diameterM|gasId|temperatureK|pressurePa|envelope\.\w/);
    expect(text).toMatch(/Diameter\s+[\d.]+ m/);
    const fingerprint = (await sheet.getByTestId('sheet-fingerprint').innerText()).trim();
    expect(fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(text).toContain(`${product.baseUrl}/verify/${fingerprint}`);
    expect(await sheet.getByRole('img', { name: /^QR code of http/ }).isVisible()).toBe(true);
  });

  it('lets an anonymous visitor verify the sheet by pasting the fingerprint as printed', async () => {
    // The fingerprint as the page prints it: four groups of 16 hexadecimal digits, across lines.
    const printed = /([0-9a-f]{16}\s+){3}[0-9a-f]{16}/.exec(sheetText)?.[0];
    expect(printed).toBeDefined();
    const visitor = await launchBrowser();
    try {
      const anonymous = await visitor.context.newPage();
      screenshotOnFailure(() => anonymous, 'verify-anonymous');
      await anonymous.goto(`${product.baseUrl}/verify`);
      await anonymous.getByLabel('Fingerprint').fill(`${printed?.toUpperCase()}\n`);
      await anonymous.getByRole('button', { name: 'Verify' }).click();
      await expect
        .poll(() =>
          anonymous.getByText('Approved, and today’s engine gives the same results').isVisible(),
        )
        .toBe(true);
      expect(anonymous.url()).toBe(`${product.baseUrl}/verify/${printed?.replace(/\s/g, '')}`);
    } finally {
      await visitor.close();
    }
  });

  it('keeps a private calculation from a student, without saying whether it exists', async () => {
    screenshotOnFailure(() => page, 'student-private');
    await signOut();
    await signIn('student@demo.test');
    await page.goto(submittedUrl);
    await expect
      .poll(() =>
        page.getByText('This calculation does not exist, or you may not see it.').isVisible(),
      )
      .toBe(true);
  });

  it('lets the admin see the users, the audit trail and the review mail in the outbox', async () => {
    screenshotOnFailure(() => page, 'admin-pages');
    await signOut();
    await signIn('admin@demo.test');
    await page.getByRole('menuitem', { name: 'Admin' }).click();
    await expect
      .poll(() => page.getByRole('cell', { name: 'designer@demo.test' }).isVisible())
      .toBe(true);
    await page.getByRole('tab', { name: 'Audit trail' }).click();
    // In words and by name, never as action codes, ids or JSON; and within a 1440 px page.
    const trail = page.getByRole('table', { name: 'Audit trail' });
    await expect
      .poll(() =>
        trail
          .getByText('Ilse Varga approved version 2 of “Browser check sphere”')
          .first()
          .isVisible(),
      )
      .toBe(true);
    const trailText = await trail.innerText();
    expect(trailText).not.toMatch(/version\.approve|[0-9a-f]{8}-[0-9a-f]{4}|[{}]/);
    expect(
      await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth),
    ).toBe(true);
    await page.getByRole('tab', { name: 'Mail outbox' }).click();
    await expect
      .poll(() => page.getByText(/Review requested: Browser check sphere, version 2/).isVisible())
      .toBe(true);
    await expect
      .poll(() =>
        page.getByText(/Approved: Browser check sphere, version 2 .* 1 attached/).isVisible(),
      )
      .toBe(true);
  });

  it('logged no errors in the browser console', () => {
    expect(consoleErrors).toEqual([]);
  });
});
