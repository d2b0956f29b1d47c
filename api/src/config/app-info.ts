import { readFileSync } from 'node:fs';
import { join } from 'node:path';

interface PackageManifest {
  readonly version: string;
}

// Both src/config and dist/config sit two levels below the api package folder.
const manifest = JSON.parse(
  readFileSync(join(__dirname, '..', '..', 'package.json'), 'utf8'),
) as PackageManifest;

/** Version of the API package, reported by the health endpoint. */
export const API_VERSION = manifest.version;
