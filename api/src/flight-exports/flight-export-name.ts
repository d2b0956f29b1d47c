/**
 * `Content-Disposition: attachment` naming the file after the calculation and version
 * (`Dune-sphere-v3-track.kml`): letters and digits kept, every other run one hyphen; an ASCII
 * `filename` for old clients and the exact name in `filename*` (RFC 6266, RFC 5987).
 */
export function attachmentHeader(title: string, versionNumber: number, file: string): string {
  const base = title.replace(/[^\p{L}\p{N}]+/gu, '-').replace(/^-|-$/g, '') || 'flight';
  const name = `${base.slice(0, 80)}-v${versionNumber}-${file}`;
  return `attachment; filename="${name.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}
