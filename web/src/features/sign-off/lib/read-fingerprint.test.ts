import { describe, expect, it } from 'vitest';
import { fingerprintOfSheetPdf, readFingerprint } from './read-fingerprint';

const FINGERPRINT = '0d58bdb9'.repeat(8);

describe('readFingerprint', () => {
  it('reads a fingerprint copied from a printed sheet, in groups, across lines, in capitals', () => {
    const printed = `${FINGERPRINT.slice(0, 16)} ${FINGERPRINT.slice(16, 32)}\n${FINGERPRINT.slice(32, 48).toUpperCase()}\r\n ${FINGERPRINT.slice(48)}`;
    expect(readFingerprint(printed)).toBe(FINGERPRINT);
  });
  it('refuses text that is not 64 hexadecimal digits', () => {
    expect(readFingerprint(FINGERPRINT.slice(1))).toBeUndefined();
    expect(readFingerprint(`${FINGERPRINT.slice(1)}g`)).toBeUndefined();
  });
});

describe('fingerprintOfSheetPdf', () => {
  it('finds the fingerprint in a PDF’s document information, and nothing in other files', async () => {
    const pdf = new Blob([
      `%PDF-1.3\n<< /Subject (Loftwright calculation, fingerprint ${FINGERPRINT}) >>`,
    ]);
    expect(await fingerprintOfSheetPdf(pdf)).toBe(FINGERPRINT);
    expect(await fingerprintOfSheetPdf(new Blob([`fingerprint ${FINGERPRINT}`]))).toBeUndefined();
  });
});
