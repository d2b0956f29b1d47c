import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { create, type Font } from 'fontkit';

/** A font file registered with a PDF document under `name`, and a way to ask it for glyphs. */
export interface SheetFont {
  name: string;
  bytes: Buffer;
  has(codePoint: number): boolean;
}

const packageDir = (name: string) => dirname(require.resolve(`${name}/package.json`));

function load(name: string, file: string, unusable: readonly number[] = []): SheetFont {
  const bytes = readFileSync(file);
  const font: Font = create(bytes);
  return {
    name,
    bytes,
    has: (codePoint) => font.hasGlyphForCodePoint(codePoint) && !unusable.includes(codePoint),
  };
}

/** The space of Plex Mono's and Plex Greek's Latin-subset files breaks fontkit's subsetter. */
const SPACE = [0x20];

/**
 * The sheet's fonts, all from npm packages (nothing fetched at run time): IBM Plex for the look,
 * DejaVu for the symbols Plex's Latin and Greek files lack (subscripts, arrows). WOFF, not WOFF2:
 * fontkit cannot subset some WOFF2 glyphs (the colon, the closing quote).
 */
export interface SheetFonts {
  sans: SheetFont;
  sansBold: SheetFont;
  mono: SheetFont;
  greek: SheetFont;
  fallbackSans: SheetFont;
  fallbackMono: SheetFont;
}

let cached: SheetFonts | undefined;

export function sheetFonts(): SheetFonts {
  if (cached) return cached;
  const plexSans = join(packageDir('@fontsource/ibm-plex-sans'), 'files');
  const plexMono = join(packageDir('@fontsource/ibm-plex-mono'), 'files');
  const dejavu = join(packageDir('dejavu-fonts-ttf'), 'ttf');
  cached = {
    sans: load('plex-sans', join(plexSans, 'ibm-plex-sans-latin-400-normal.woff')),
    sansBold: load('plex-sans-bold', join(plexSans, 'ibm-plex-sans-latin-600-normal.woff')),
    mono: load('plex-mono', join(plexMono, 'ibm-plex-mono-latin-400-normal.woff'), SPACE),
    greek: load('plex-sans-greek', join(plexSans, 'ibm-plex-sans-greek-400-normal.woff'), SPACE),
    fallbackSans: load('dejavu-sans', join(dejavu, 'DejaVuSans.ttf')),
    fallbackMono: load('dejavu-mono', join(dejavu, 'DejaVuSansMono.ttf')),
  };
  return cached;
}

/** Splits text into runs, each in the first of `fonts` that has every glyph of the run. */
export function fontRuns(
  text: string,
  fonts: readonly SheetFont[],
): { font: SheetFont; text: string }[] {
  const runs: { font: SheetFont; text: string }[] = [];
  for (const character of text) {
    const codePoint = character.codePointAt(0) ?? 32;
    const font = fonts.find((candidate) => candidate.has(codePoint)) ?? fonts[fonts.length - 1];
    if (!font) continue;
    const last = runs.at(-1);
    if (last && last.font === font) last.text += character;
    else runs.push({ font, text: character });
  }
  return runs;
}
