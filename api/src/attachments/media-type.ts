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

/**
 * Plain text: valid UTF-8 with no NUL and almost no control characters, read chunk by chunk so a
 * large file is never decoded at once. Anything that passes is served as text, never as HTML or
 * script, whatever it contains.
 */
async function isPlainText(chunks: AsyncIterable<Buffer>): Promise<boolean> {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  let length = 0;
  let controls = 0;
  const count = (text: string): boolean => {
    for (let index = 0; index < text.length; index += 1) {
      const code = text.charCodeAt(index);
      if (code === 0) return false;
      if (code < 32 && code !== 9 && code !== 10 && code !== 13 && code !== 12) controls += 1;
    }
    length += text.length;
    return true;
  };
  try {
    for await (const chunk of chunks) {
      if (!count(decoder.decode(chunk, { stream: true }))) return false;
    }
    if (!count(decoder.decode())) return false;
  } catch {
    return false;
  }
  return controls <= length / 1000;
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
 * The media type of an upload from its bytes (magic numbers via file-type on its first bytes,
 * then a text check over the whole file), never from its name or the client's Content-Type.
 * @param head the first bytes of the file (4 100 are enough for file-type)
 * @param chunks the whole file, read again in chunks, for the text check
 */
export async function sniffMediaType(
  head: Buffer,
  chunks: () => AsyncIterable<Buffer>,
): Promise<Sniffed> {
  if (head.length === 0) return { ok: false, reason: 'is empty' };
  const found = await fileTypeFromBuffer(head);
  if (found) {
    if (ALLOWED_BINARY_TYPES[found.mime]) return { ok: true, mediaType: found.mime };
    return {
      ok: false,
      reason: `is ${found.mime} (.${found.ext}) by its content; allowed are ${ALLOWED_DESCRIPTION}`,
    };
  }
  if (await isPlainText(chunks())) {
    const start = new TextDecoder('utf-8').decode(head);
    return { ok: true, mediaType: looksLikeCsv(start) ? 'text/csv' : 'text/plain' };
  }
  return {
    ok: false,
    reason: `is not a type Loftwright recognises by its content; allowed are ${ALLOWED_DESCRIPTION}`,
  };
}
