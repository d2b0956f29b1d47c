import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type Browser } from './support/browser.js';
import { screenshotOnFailure } from './support/screenshot-on-failure.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

const DEMO_PASSWORD = 'loftwright-demo';

interface OutboxMail {
  to: string[];
  subject: string;
  text: string;
}

/** What each kind of mailed link must open: a heading the page promises, by the link's path. */
const PROMISES: { path: RegExp; heading: RegExp }[] = [
  { path: /^\/calculations\/[\w-]+\/versions\/\d+$/, heading: /, version \d+$/ },
  { path: /^\/reset-password$/, heading: /^Choose a new password$/ },
  { path: /^\/sign-in$/, heading: /^Sign in$/ },
  { path: /^\/forgot-password$/, heading: /^Reset your password$/ },
];

describe('every link the product mails lands on the page it promises', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  let mails: OutboxMail[] = [];

  const post = (path: string, body: unknown) =>
    fetch(`${product.baseUrl}${path}`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify(body),
    });

  beforeAll(async () => {
    product = await startProduct();
    browser = await launchBrowser();
    page = await browser.context.newPage();
    // The demo's reviews mailed requests, approvals and send-backs; add the account mails.
    expect(
      (await post('/api/auth/password-reset/request', { email: 'designer@demo.test' })).status,
    ).toBe(202);
    expect(
      (
        await post('/api/auth/register', {
          email: 'newcomer@example.test',
          password: 'a-long-password-1',
          displayName: 'New Comer',
        })
      ).status,
    ).toBe(202);
    expect(
      (
        await post('/api/auth/register', {
          email: 'reviewer@demo.test',
          password: 'a-long-password-2',
          displayName: 'Someone',
        })
      ).status,
    ).toBe(202);
    const signedIn = await post('/api/auth/login', {
      email: 'admin@demo.test',
      password: DEMO_PASSWORD,
    });
    const { accessToken } = (await signedIn.json()) as { accessToken: string };
    const kinds = [
      'Review requested',
      'Approved',
      'Changes requested',
      'Reset your',
      'Finish creating',
      'Someone tried',
    ];
    // Mail goes out after each request has answered: ask until every kind has arrived.
    for (;;) {
      const outbox = await fetch(`${product.baseUrl}/api/admin/outbox?pageSize=100`, {
        headers: { Authorization: `Bearer ${accessToken}` },
      });
      mails = ((await outbox.json()) as { items: OutboxMail[] }).items;
      if (kinds.every((kind) => mails.some((mail) => mail.subject.startsWith(kind)))) break;
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    // Links to calculations need a reader: the admin may open every one.
    await page.goto(`${product.baseUrl}/sign-in`);
    await page.getByLabel('E-mail').fill('admin@demo.test');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${product.baseUrl}/calculations`);
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  const linksIn = (mail: OutboxMail) =>
    (mail.text.match(/https?:\/\/\S+/g) ?? []).map((link) => new URL(link));

  it('opens each link of the review, approval, send-back and account mails', async () => {
    screenshotOnFailure(() => page, 'mail-links');
    const links = mails
      .flatMap(linksIn)
      .filter((url) => !url.pathname.startsWith('/confirm-account'));
    expect(links.length).toBeGreaterThanOrEqual(6);
    for (const url of links) {
      const promise = PROMISES.find((candidate) => candidate.path.test(url.pathname));
      expect(promise, `a page is promised for ${url.pathname}`).toBeDefined();
      // The mail names the public host; the test browses the loopback address it started.
      await page.goto(`${product.baseUrl}${url.pathname}${url.search}`);
      const heading = page.getByRole('heading', { name: promise?.heading });
      await expect.poll(() => heading.first().isVisible(), { timeout: 20_000 }).toBe(true);
      expect(await page.getByRole('heading', { name: 'Page not found' }).count()).toBe(0);
    }
  }, 180_000);

  it('opens the registration link: the account is created and signed in', async () => {
    const mail = mails.find((candidate) => candidate.subject.startsWith('Finish creating'));
    const link = mail ? linksIn(mail)[0] : undefined;
    expect(link?.pathname).toBe('/confirm-account');
    const newcomer = await launchBrowser();
    try {
      const fresh = await newcomer.context.newPage();
      await fresh.goto(`${product.baseUrl}${link?.pathname}${link?.search}`);
      await fresh.waitForURL(`${product.baseUrl}/calculations`);
    } finally {
      await newcomer.close();
    }
  });
});
