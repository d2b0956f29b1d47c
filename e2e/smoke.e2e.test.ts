import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FIRST_ROUTE_BUDGET_BYTES, ROUTE_MODULES, routeJs } from '../web/scripts/route-js-size.mjs';
import { launchBrowser, type Browser } from './support/browser.js';
import { WEB_DIST } from './support/paths.js';
import { startProduct, type RunningProduct } from './support/start-product.js';

describe('the product, started as npm start starts it', () => {
  let product: RunningProduct;
  let browser: Browser;
  let page: Page;
  const requestedUrls: string[] = [];

  beforeAll(async () => {
    product = await startProduct();
    browser = await launchBrowser();
    page = await browser.context.newPage();
    page.on('request', (request) => requestedUrls.push(request.url()));
  });

  afterAll(async () => {
    await browser?.close();
    await product?.stop();
  });

  it('says in its log where it listens', () => {
    expect(product.output()).toContain(`Listening on http://localhost:${product.port}`);
  });

  it('answers GET /api/health with 200 and a working database', async () => {
    const response = await page.request.get(`${product.baseUrl}/api/health`);
    expect(response.status()).toBe(200);
    expect(await response.json()).toMatchObject({ status: 'ok', database: 'ok' });
  });

  it('renders the home page in IBM Plex Sans, with every file from its own origin', async () => {
    await page.goto(`${product.baseUrl}/`);
    await expect
      .poll(() => page.getByRole('heading', { name: 'Workbench' }).isVisible())
      .toBe(true);

    const fonts = await page.evaluate(async () => {
      await document.fonts.ready;
      const heading = document.querySelector('h1');
      return {
        bodyFamily: getComputedStyle(document.body).fontFamily,
        headingFamily: heading ? getComputedStyle(heading).fontFamily : '',
        plexSansLoaded: document.fonts.check('16px "IBM Plex Sans"'),
        loadedFaces: [...document.fonts]
          .filter((face) => face.status === 'loaded')
          .map((face) => face.family),
      };
    });
    expect(fonts.bodyFamily).toMatch(/^"?IBM Plex Sans"?/);
    expect(fonts.headingFamily).toMatch(/^"?IBM Plex Sans"?/);
    expect(fonts.plexSansLoaded).toBe(true);
    expect(fonts.loadedFaces.some((family) => family.includes('IBM Plex Sans'))).toBe(true);

    const foreign = requestedUrls.filter(
      (url) => !url.startsWith(product.baseUrl) && !url.startsWith('data:'),
    );
    expect(foreign).toEqual([]);
  });

  it('computes air density in the browser and shows the server status from the API', async () => {
    await page.goto(`${product.baseUrl}/`);
    // U.S. Standard Atmosphere 1976, Table I: 1.2250 kg/m3 at 15 °C, 1013.25 hPa.
    await expect.poll(() => page.getByRole('status').first().textContent()).toContain('1.2250');
    await expect.poll(() => page.getByText('Connected').isVisible()).toBe(true);
  });

  it('shows the not-found page for an unknown route, loaded directly', async () => {
    const response = await page.goto(`${product.baseUrl}/no/such/page`);
    expect(response?.status()).toBe(200);
    await expect
      .poll(() => page.getByRole('heading', { name: 'Page not found' }).isVisible())
      .toBe(true);
    expect(await page.getByText('/no/such/page').isVisible()).toBe(true);
  });

  it('keeps a client-side route on reload', async () => {
    await page.goto(`${product.baseUrl}/`);
    await page.getByRole('menuitem', { name: /sign in/i }).click();
    await expect.poll(() => page.url()).toBe(`${product.baseUrl}/sign-in`);
    await page.reload();
    await expect.poll(() => page.getByRole('heading', { name: 'Sign in' }).isVisible()).toBe(true);
  });

  it('sends the first page in at most 350 kB of gzip JavaScript, as the build report says', async () => {
    // A browser of its own: nothing cached from the tests before.
    const own = await launchBrowser();
    const fresh = await own.context.newPage();
    const scripts: { url: string; bytes: Promise<number> }[] = [];
    fresh.on('requestfinished', (request) => {
      if (request.resourceType() !== 'script') return;
      scripts.push({
        url: request.url(),
        bytes: request.sizes().then((sizes) => sizes.responseBodySize),
      });
    });
    await fresh.goto(`${product.baseUrl}/`);
    await expect.poll(() => fresh.getByText('Connected').isVisible()).toBe(true);
    const sentBytes = (await Promise.all(scripts.map((script) => script.bytes))).reduce(
      (sum, bytes) => sum + bytes,
      0,
    );
    const home = ROUTE_MODULES['/ (home)'] ?? '';
    const reported = routeJs(WEB_DIST, home);
    expect(sentBytes).toBeLessThanOrEqual(FIRST_ROUTE_BUDGET_BYTES);
    // The bench's figure is what the browser really fetched: the same files, the same size
    // within what two gzip runs of the same level differ by.
    expect(scripts.map((script) => new URL(script.url).pathname.slice(1)).sort()).toEqual(
      [...reported.files].sort(),
    );
    expect(Math.abs(sentBytes / reported.gzipBytes - 1)).toBeLessThan(0.02);
    await own.close();
  });
});
