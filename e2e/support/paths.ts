import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

export const REPO_ROOT = fileURLToPath(new URL('../..', import.meta.url));
export const API_ENTRY = join(REPO_ROOT, 'api', 'dist', 'main.js');
export const WEB_INDEX = join(REPO_ROOT, 'web', 'dist', 'index.html');
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
export const WEB_DIST = join(REPO_ROOT, 'web', 'dist');
