/** Where STORAGE_URL points: a bucket and a key prefix inside it ('' or ending in '/'). */
export interface S3Location {
  readonly bucket: string;
  readonly prefix: string;
}

/**
 * Bucket names as S3 allows them (3–63 lowercase letters, digits, dots and hyphens, starting and
 * ending with a letter or digit; AWS S3 User Guide, "General purpose bucket naming rules").
 */
const BUCKET = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;
/** A prefix of plain path segments: no empty, "." or ".." segment, no control characters. */
const PREFIX_SEGMENT = /^[\w.\-~+=@,]+$/;

/** Why STORAGE_URL is malformed, or null when it is a usable s3://bucket[/prefix]. */
export function storageUrlProblem(value: string): string | null {
  const match = /^s3:\/\/([^/]+)(\/.*)?$/.exec(value);
  if (!match) return 'must look like s3://bucket or s3://bucket/prefix';
  if (!BUCKET.test(match[1] ?? '')) {
    return 'names a bucket S3 does not allow (3–63 lowercase letters, digits, dots, hyphens)';
  }
  const segments = (match[2] ?? '').split('/').filter((segment) => segment !== '');
  if (segments.some((segment) => !PREFIX_SEGMENT.test(segment) || /^\.+$/.test(segment))) {
    return 'has a prefix with characters or segments other than letters, digits and . - _ ~ + = @ ,';
  }
  return null;
}

/** The bucket and prefix of a STORAGE_URL already checked by storageUrlProblem. */
export function parseStorageUrl(value: string): S3Location {
  const problem = storageUrlProblem(value);
  if (problem) throw new Error(`STORAGE_URL ${problem}`);
  const [, bucket = '', path = ''] = /^s3:\/\/([^/]+)(\/.*)?$/.exec(value) ?? [];
  const segments = path.split('/').filter((segment) => segment !== '');
  return { bucket, prefix: segments.length > 0 ? `${segments.join('/')}/` : '' };
}
