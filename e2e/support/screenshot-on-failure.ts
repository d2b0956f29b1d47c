import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { onTestFailed } from 'vitest';
import { REPO_ROOT } from './paths.js';

/** Call at the start of a test: if it fails, the page is saved to e2e/screenshots/<name>.png. */
export function screenshotOnFailure(page: () => Page | undefined, name: string): void {
  onTestFailed(async () => {
    const current = page();
    if (!current) return;
    const directory = join(REPO_ROOT, 'e2e', 'screenshots');
    mkdirSync(directory, { recursive: true });
    await current.screenshot({
      path: join(directory, `${name.replace(/[^\w-]+/g, '-')}.png`),
      fullPage: true,
    });
  });
}
