import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { collectConsoleErrors } from './support/console-errors.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';
const COMMENT = 'Measure the diameter again: the drawing says 1.3 m.';

describe('the review loop: a comment on an input, sent back, addressed, approved', () => {
  let product: RunningProduct;
  let designerBrowser: Browser;
  let reviewerBrowser: Browser;
  let designer: Page;
  let reviewer: Page;
  let errors: string[][] = [];
  let calculationUrl = '';

  const signIn = async (page: Page, email: string) => {
    await page.goto(`${product.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${product.baseUrl}/calculations`);
  };

  beforeAll(async () => {
    product = await startProduct();
    designerBrowser = await launchBrowser();
    reviewerBrowser = await launchBrowser();
    designer = await designerBrowser.context.newPage();
    reviewer = await reviewerBrowser.context.newPage();
    // Each list fills as the pages log; both are checked at the end.
    errors = [collectConsoleErrors(designer), collectConsoleErrors(reviewer)];
    await signIn(designer, 'designer@demo.test');
    await signIn(reviewer, 'reviewer@demo.test');
  }, 120_000);

  afterAll(async () => {
    await designerBrowser?.close();
    await reviewerBrowser?.close();
    await product?.stop();
  });

  it('lets the designer create a calculation and submit it after a confirmation', async () => {
    screenshotOnFailure(() => designer, 'loop-submit');
    await designer.getByRole('button', { name: 'New calculation' }).click();
    const dialog = designer.getByRole('dialog');
    await dialog.getByLabel('Title').fill('Loop sphere');
    await dialog.getByRole('button', { name: 'Create' }).click();
    await expect.poll(() => designer.url()).toMatch(/\/calculations\/[0-9a-f-]{36}$/);
    calculationUrl = designer.url();
    await designer.getByRole('button', { name: 'Submit version 1 for review' }).click();
    const confirm = designer.getByRole('dialog', { name: 'Submit version 1 for review?' });
    await confirm.getByRole('button', { name: 'Submit to any reviewer' }).click();
    await expect
      .poll(() => designer.getByText('Version 1 is in review with any reviewer.').isVisible())
      .toBe(true);
  });

  it('lets the reviewer anchor a comment to an input and send the version back', async () => {
    screenshotOnFailure(() => reviewer, 'loop-comment');
    await reviewer.goto(calculationUrl);
    await reviewer.getByLabel('Comment on').click();
    await reviewer
      .locator('.ant-select-item-option')
      .filter({ hasText: /^Diameter \(/ })
      .click();
    await reviewer.getByLabel('Comment text').fill(COMMENT);
    await reviewer.getByRole('button', { name: 'Add comment' }).click();
    await expect
      .poll(() => reviewer.getByText('Review comments: 1 open of 1').isVisible())
      .toBe(true);
    await reviewer
      .getByLabel('Review comment', { exact: true })
      .fill('See the comment on the diameter.');
    await reviewer.getByRole('button', { name: 'Send back' }).click();
    await expect.poll(() => reviewer.getByText('Version 1 sent back.').isVisible()).toBe(true);
  });

  it('shows the designer the comment beside the field, and takes “addressed” after a new version', async () => {
    screenshotOnFailure(() => designer, 'loop-addressed');
    await designer.goto(calculationUrl);
    const besideField = designer.getByRole('list', { name: 'Review comments on this input' });
    await expect.poll(() => besideField.isVisible()).toBe(true);
    expect(await besideField.innerText()).toContain(`Ilse Varga (version 1): “${COMMENT}”`);
    // What the reviewer said on sending back shows on the page too, not only in the mail.
    await expect
      .poll(() => designer.getByText(/Ilse Varga sent back version 1 on/).isVisible())
      .toBe(true);
    await designer.getByLabel('Diameter', { exact: true }).fill('1.3 m');
    await designer.getByRole('button', { name: 'Save as version 2' }).click();
    await expect.poll(() => designer.getByText('Saved as version 2.').isVisible()).toBe(true);
    await designer.getByRole('button', { name: 'Addressed in version 2' }).click();
    await expect
      .poll(() => designer.getByText('Review comments: 0 open of 1').isVisible())
      .toBe(true);
    expect(await besideField.count()).toBe(0);
    await designer.getByRole('button', { name: 'Submit version 2 for review' }).click();
    await designer
      .getByRole('dialog', { name: 'Submit version 2 for review?' })
      .getByRole('button', { name: 'Submit to any reviewer' })
      .click();
    await expect
      .poll(() => designer.getByText('Version 2 is in review with any reviewer.').isVisible())
      .toBe(true);
  });

  it('lets the reviewer see the comment addressed and approve', async () => {
    screenshotOnFailure(() => reviewer, 'loop-approve');
    await reviewer.goto(calculationUrl);
    await expect
      .poll(() => reviewer.getByText('Addressed in version 2', { exact: true }).isVisible())
      .toBe(true);
    await reviewer.getByRole('button', { name: 'Approve' }).click();
    await expect.poll(() => reviewer.getByText('Version 2 approved.').isVisible()).toBe(true);
  });

  it('logged no errors in either browser', () => {
    expect(errors.flat()).toEqual([]);
  });
});
