// fontkit (a dependency of pdfkit) ships no types; Loftwright only asks a font whether it has a glyph.
declare module 'fontkit' {
  export interface Font {
    hasGlyphForCodePoint(codePoint: number): boolean;
  }
  export function create(buffer: Buffer): Font;
}
