/**
 * A client's file name made safe to show and to offer back in Content-Disposition: no folders,
 * no control characters, at most 200 characters. It is never used as a path.
 */
export function cleanFileName(original: string | undefined): string {
  const base = (original ?? '').split(/[/\\]/).pop() ?? '';
  const cleaned = [...base]
    .filter(
      (character) => character.charCodeAt(0) >= 32 && character !== '\u007f' && character !== '"',
    )
    .join('')
    .replace(/^\.+/, '')
    .trim()
    .slice(0, 200);
  return cleaned === '' ? 'upload' : cleaned;
}

/** Content-Disposition for a file name, ASCII fallback plus the RFC 5987 UTF-8 form. */
export function contentDisposition(kind: 'inline' | 'attachment', fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, '_').replace(/[\\%]/g, '_');
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(fileName)}`;
}
