import { afterEach, describe, expect, it, vi } from 'vitest';
import { guessNumberFormat } from './guess-number-format';

/** What Intl gives for 1 234 567,5 when the locale groups with `group`. */
const commaDecimalParts = (group: string): Intl.NumberFormatPart[] => [
  { type: 'integer', value: '1' },
  { type: 'group', value: group },
  { type: 'integer', value: '234' },
  { type: 'group', value: group },
  { type: 'integer', value: '567' },
  { type: 'decimal', value: ',' },
  { type: 'fraction', value: '5' },
];

describe('guessNumberFormat', () => {
  afterEach(() => {
    vi.restoreAllMocks();
  });

  // Separators as CLDR gives them, checked against Node 20's ICU (CLDR 44+).
  it.each([
    ['en-US', 'point-comma'], // 1,234,567.5
    ['de-DE', 'comma-point'], // 1.234.567,5
    ['fr-FR', 'comma-space'], // 1 234 567,5 with U+202F narrow no-break spaces
    ['sv-SE', 'comma-space'], // 1 234 567,5 with U+00A0 no-break spaces
    ['de-CH', 'point-comma'], // 1'234'567.5: a decimal point, whatever the group
    ['es-ES', 'comma-point'], // 1234,5 but 1.234.567,5: four digits alone are not grouped
    ['it-IT', 'comma-point'], // as es-ES
  ])('reads %s as %s', (locale, expected) => {
    expect(guessNumberFormat(locale)).toBe(expected);
  });

  it.each([
    ['a plain space U+0020', ' '],
    ['a no-break space U+00A0', '\u00a0'],
    ['a narrow no-break space U+202F', '\u202f'],
  ])('reads sv-SE grouped with %s as comma-space', (_label, group) => {
    // Browsers and ICU versions differ in which space sv-SE gets; every kind is the same format.
    const formatToParts = vi
      .spyOn(Intl.NumberFormat.prototype, 'formatToParts')
      .mockReturnValue(commaDecimalParts(group));
    expect(guessNumberFormat('sv-SE')).toBe('comma-space');
    expect(formatToParts).toHaveBeenCalledWith(1234567.5);
  });

  it('falls back to point-comma for a locale Intl refuses', () => {
    expect(guessNumberFormat('not a locale')).toBe('point-comma');
  });

  it('falls back to point-comma for a decimal mark that is neither point nor comma', () => {
    // ar-EG writes ١٬٢٣٤٬٥٦٧٫٥ with the Arabic decimal separator U+066B.
    expect(guessNumberFormat('ar-EG')).toBe('point-comma');
  });

  it("reads the browser's language when given no locale", () => {
    vi.spyOn(navigator, 'language', 'get').mockReturnValue('de-DE');
    expect(guessNumberFormat()).toBe('comma-point');
  });
});
