import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';

/**
 * SHA-256 (hex) of the RFC 8785 canonical JSON of a version's inputs, outputs and engine version:
 * the same content always gives the same fingerprint, whatever the key order it was stored in.
 */
export function versionFingerprint(
  inputs: unknown,
  outputs: unknown,
  engineVersion: string,
): string {
  const canonical = canonicalize({ engineVersion, inputs, outputs });
  if (canonical === undefined) throw new Error('version content cannot be serialised');
  return createHash('sha256').update(canonical, 'utf8').digest('hex');
}
