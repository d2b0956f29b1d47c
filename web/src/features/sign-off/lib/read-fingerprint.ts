/**
 * A fingerprint as a person copies it from paper or a PDF: spaces, line breaks, hyphens and
 * capitals are dropped. Answers the 64 hexadecimal digits, or undefined if the text is not one.
 */
export function readFingerprint(text: string): string | undefined {
  const compact = text.replace(/[\s-]+/g, '').toLowerCase();
  return /^[0-9a-f]{64}$/.test(compact) ? compact : undefined;
}

/**
 * The fingerprint a Loftwright sign-off PDF carries in its document information ("…fingerprint
 * <64 hex digits>"), read from the file's bytes; undefined when the file has none.
 */
export async function fingerprintOfSheetPdf(file: Blob): Promise<string | undefined> {
  const bytes = new Uint8Array(await file.arrayBuffer());
  if (String.fromCharCode(...bytes.subarray(0, 5)) !== '%PDF-') return undefined;
  const text = new TextDecoder('latin1').decode(bytes);
  return /fingerprint ([0-9a-f]{64})/.exec(text)?.[1];
}
