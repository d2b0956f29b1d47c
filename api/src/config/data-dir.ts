import { chmodSync, closeSync, mkdirSync, openSync, readdirSync } from 'node:fs';
import { join, resolve } from 'node:path';

const OWNER_ONLY_DIRECTORY = 0o700;
const OWNER_ONLY_FILE = 0o600;
const prepared = new Set<string>();

/**
 * Makes DATA_DIR private to the account the server runs as, whatever the umask: the folder and
 * every folder in it 0700, every file 0600 (the database holds password hashes, sessions and the
 * local mailbox; the folder holds the signing key). Files made before this rule are tightened
 * once per process. Returns the absolute path.
 */
export function preparePrivateDataDir(dataDir: string): string {
  const directory = resolve(dataDir);
  mkdirSync(directory, { recursive: true, mode: OWNER_ONLY_DIRECTORY });
  chmodSync(directory, OWNER_ONLY_DIRECTORY);
  if (!prepared.has(directory)) {
    tighten(directory);
    prepared.add(directory);
  }
  return directory;
}

/** Creates `file` empty, owner-only, if it does not exist, so whatever opens it later keeps 0600. */
export function createPrivateFile(file: string): void {
  closeSync(openSync(file, 'a', OWNER_ONLY_FILE));
  chmodSync(file, OWNER_ONLY_FILE);
}

/** A folder made inside DATA_DIR (uploads and their fan-out), owner-only. */
export function makePrivateDirectory(directory: string): void {
  mkdirSync(directory, { recursive: true, mode: OWNER_ONLY_DIRECTORY });
  chmodSync(directory, OWNER_ONLY_DIRECTORY);
}

function tighten(directory: string): void {
  chmodSync(directory, OWNER_ONLY_DIRECTORY);
  for (const entry of readdirSync(directory, { withFileTypes: true })) {
    const path = join(directory, entry.name);
    if (entry.isDirectory()) tighten(path);
    else if (entry.isFile()) chmodSync(path, OWNER_ONLY_FILE);
  }
}
