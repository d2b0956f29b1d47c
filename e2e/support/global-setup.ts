import { execFileSync } from 'node:child_process';
import { accessSync, constants, existsSync } from 'node:fs';
import { API_ENTRY, CHROMIUM_PATH, WEB_INDEX } from './paths.js';

/**
 * Fails the browser suite before it starts when what it needs is missing, and says how to get
 * it. It never skips: a missing browser is a failed run, not a green one.
 */
export default function checkPrerequisites(): void {
  const problems: string[] = [];
  try {
    accessSync(CHROMIUM_PATH, constants.X_OK);
  } catch {
    problems.push(
      `Chromium was not found at ${CHROMIUM_PATH}. Install Debian's package with ` +
        '"sudo apt-get install -y chromium", or set CHROMIUM_PATH to a Chromium binary.',
    );
  }
  try {
    execFileSync('pdftoppm', ['-v'], { stdio: 'ignore' });
  } catch {
    problems.push(
      "pdftoppm was not found; the sign-off PDF checks need it. Install Debian's package with " +
        '"sudo apt-get install -y poppler-utils".',
    );
  }
  if (!existsSync(API_ENTRY) || !existsSync(WEB_INDEX)) {
    problems.push('The product is not built. Run "npm run build" (npm test does it for you).');
  }
  if (problems.length > 0) {
    throw new Error(`Browser tests cannot run:\n- ${problems.join('\n- ')}`);
  }
}
