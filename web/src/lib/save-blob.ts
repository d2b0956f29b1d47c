/** Hands a Blob to the browser as a download named `fileName`. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  // The click has started the download; the URL is not needed after this turn.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

/** The file name a Content-Disposition header offers, preferring its UTF-8 form. */
export function dispositionFileName(header: string | undefined, fallback: string): string {
  const utf8 = header?.match(/filename\*=UTF-8''([^;]+)/i)?.[1];
  if (utf8) return decodeURIComponent(utf8);
  return header?.match(/filename="([^"]+)"/i)?.[1] ?? fallback;
}
