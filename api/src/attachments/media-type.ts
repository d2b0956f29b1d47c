import { fileTypeFromBuffer } from 'file-type';

/** What may be uploaded, by the type its content shows: photos, logger exports, documents. */
export const ALLOWED_BINARY_TYPES: Record<string, string> = {
  'image/jpeg': 'JPEG image',
  'image/png': 'PNG image',
  'image/webp': 'WebP image',
  'image/gif': 'GIF image',
  'application/pdf': 'PDF',
};

export const ALLOWED_DESCRIPTION = 'JPEG, PNG, WebP or GIF images, PDF files, CSV or plain text';

export type Sniffed = { ok: true; mediaType: string } | { ok: false; reason: string };

const strictUtf8 = new TextDecoder('utf-8', { fatal: true });

/**
 * Plain text: valid UTF-8 with no NUL and almost no control characters. Anything that passes is
 * served as text, never as HTML or script, whatever it contains.
 */
function asText(buffer: Buffer): string | undefined {
  let text: string;
  try {
    text = strictUtf8.decode(buffer);
  } catch {
    return undefined;
  }
  let controls = 0;
  for (let index = 0; index < text.length; index += 1) {
    const code = text.charCodeAt(index);
    if (code === 0) return undefined;
    if (code < 32 && code !== 9 && code !== 10 && code !== 13 && code !== 12) controls += 1;
  }
  return controls <= text.length / 1000 ? text : undefined;
}

/** A delimiter that splits the first few non-empty lines into the same number of columns. */
function looksLikeCsv(text: string): boolean {
  const lines = text
    .split(/\r?\n/)
    .filter((line) => line.trim() !== '')
    .slice(0, 5);
  if (lines.length === 0) return false;
  return [',', ';', '\t'].some((delimiter) => {
    const counts = lines.map((line) => line.split(delimiter).length);
    return (counts[0] ?? 1) > 1 && counts.every((count) => count === counts[0]);
  });
}

/**
 * The media type of an upload from its bytes (magic numbers via file-type, then a text check),
 * never from its name or the client's Content-Type.
 */
export async function sniffMediaType(buffer: Buffer): Promise<Sniffed> {
  if (buffer.length === 0) return { ok: false, reason: 'is empty' };
  const found = await fileTypeFromBuffer(buffer);
  if (found) {
    if (ALLOWED_BINARY_TYPES[found.mime]) return { ok: true, mediaType: found.mime };
    return {
      ok: false,
      reason: `is ${found.mime} (.${found.ext}) by its content; allowed are ${ALLOWED_DESCRIPTION}`,
    };
  }
  const text = asText(buffer);
  if (text !== undefined) {
    return { ok: true, mediaType: looksLikeCsv(text) ? 'text/csv' : 'text/plain' };
  }
  return {
    ok: false,
    reason: `is not a type Loftwright recognises by its content; allowed are ${ALLOWED_DESCRIPTION}`,
  };
}
