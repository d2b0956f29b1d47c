import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';
import { CHROMIUM_PATH } from './paths.js';

/**
 * Flags this machine needs: no sandbox as root, no GPU, and no background connections (the
 * network is closed, and Chromium would otherwise keep trying to reach its services).
 */
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface Browser {
  readonly context: BrowserContext;
  close(): Promise<void>;
}

/**
 * Launches Debian's Chromium headless with a fresh, throw-away profile. `locale` sets the
 * browser's language (navigator.language, Accept-Language, Intl), as a person's system would.
 */
export async function launchBrowser(options: { locale?: string } = {}): Promise<Browser> {
  const profileDir = mkdtempSync(join(tmpdir(), 'loftwright-chromium-'));
  const context = await chromium.launchPersistentContext(profileDir, {
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport: { width: 1280, height: 800 },
    ...(options.locale ? { locale: options.locale } : {}),
  });
  return {
    context,
    async close() {
      await context.close();
      rmSync(profileDir, { recursive: true, force: true });
    },
  };
}
