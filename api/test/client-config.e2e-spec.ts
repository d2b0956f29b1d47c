import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createTestApp, type TestApp } from './support/create-test-app';

const TEMPLATE = 'https://tiles.example.org:8443/base/{z}/{x}/{y}.png';
const ATTRIBUTION = '© Example tile contributors';

/** The sources the Content-Security-Policy header allows for images. */
function imgSources(csp: string | undefined): string[] {
  const directive = (csp ?? '')
    .split(';')
    .map((part) => part.trim())
    .find((part) => part.startsWith('img-src '));
  return directive?.split(/\s+/).slice(1) ?? [];
}

// Every case boots the whole app from a fresh module graph, which on a busy machine takes longer
// than the suite's default time for one test.
describe('GET /api/client-config and the base map tiles', { timeout: 60_000 }, () => {
  let testApp: TestApp | undefined;
  // Each case boots the app from a fresh module graph, so its environment is read anew.
  beforeEach(() => {
    vi.resetModules();
    delete process.env.MAP_TILE_URL;
    delete process.env.MAP_TILE_ATTRIBUTION;
  });
  afterEach(async () => {
    await testApp?.close();
    testApp = undefined;
    delete process.env.MAP_TILE_URL;
    delete process.env.MAP_TILE_ATTRIBUTION;
  });

  it('answers no tiles by default, without sign-in, and lets images come only from itself', async () => {
    testApp = await createTestApp();
    const response = await request(testApp.app.getHttpServer())
      .get('/api/client-config')
      .expect(200);
    expect(response.body).toEqual({ mapTiles: null });
    expect(imgSources(response.headers['content-security-policy'])).toEqual([
      "'self'",
      'data:',
      'blob:',
    ]);
  });

  it('answers the configured template and attribution, and allows exactly that origin', async () => {
    testApp = await createTestApp({
      env: { MAP_TILE_URL: TEMPLATE, MAP_TILE_ATTRIBUTION: ATTRIBUTION },
    });
    const response = await request(testApp.app.getHttpServer())
      .get('/api/client-config')
      .expect(200);
    expect(response.body).toEqual({
      mapTiles: { urlTemplate: TEMPLATE, attribution: ATTRIBUTION },
    });
    expect(imgSources(response.headers['content-security-policy'])).toEqual([
      "'self'",
      'data:',
      'blob:',
      'https://tiles.example.org:8443',
    ]);
    // Tile requests then carry no page address (docs/deployment.md, "Base map tiles").
    expect(response.headers['referrer-policy']).toBe('no-referrer');
  });

  it('refuses to start with a malformed template, naming the variable', async () => {
    await expect(
      createTestApp({
        env: {
          MAP_TILE_URL: 'https://tiles.example.org/{z}/{x}.png',
          MAP_TILE_ATTRIBUTION: ATTRIBUTION,
        },
      }),
    ).rejects.toThrow(/Invalid environment:[\s\S]*MAP_TILE_URL must contain \{y\}/);
  });

  it('refuses to start with a tile server but no attribution', async () => {
    await expect(createTestApp({ env: { MAP_TILE_URL: TEMPLATE } })).rejects.toThrow(
      /MAP_TILE_ATTRIBUTION must be set when MAP_TILE_URL is/,
    );
  });
});
