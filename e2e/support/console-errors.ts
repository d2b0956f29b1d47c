import type { Page } from 'playwright-core';

// Chromium logs every HTTP error answer as a console error. A 4xx from the API that the page
// handles and explains (a hidden calculation's 404, say) is not a fault of the page.
const HANDLED_API_ANSWER = /^Failed to load resource: the server responded with a status of 4\d\d/;

/** Collects what the page logs as errors (console and uncaught), to assert there were none. */
export function collectConsoleErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error' && !HANDLED_API_ANSWER.test(message.text()))
      errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));
  return errors;
}
