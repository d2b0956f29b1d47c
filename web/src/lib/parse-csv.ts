import Papa from 'papaparse';

export interface ParsedCsv {
  columns: string[];
  /** Data rows with the file's line number of each (the header is line 1). */
  rows: { line: number; cells: Record<string, string> }[];
  problems: { line: number; reason: string }[];
}

const DELIMITERS = [',', ';', '\t', '|'] as const;

/**
 * The separator the header row uses most. Data rows cannot decide it: in a decimal-comma file
 * "0;1,2" holds as many commas as semicolons, and the header's names hold neither.
 */
function headerDelimiter(text: string): string {
  const header = text.split(/\r?\n/, 1)[0] ?? '';
  const counts = DELIMITERS.map((delimiter) => header.split(delimiter).length - 1);
  const most = Math.max(...counts);
  return most === 0 ? ',' : (DELIMITERS[counts.indexOf(most)] ?? ',');
}

/** A CSV file with a header row, blank lines left out but counted. */
export function parseCsv(text: string): ParsedCsv {
  const parsed = Papa.parse<Record<string, string>>(text, {
    header: true,
    delimiter: headerDelimiter(text),
    skipEmptyLines: false,
    transformHeader: (header) => header.trim(),
  });
  const rows: ParsedCsv['rows'] = [];
  const blankRows = new Set<number>();
  parsed.data.forEach((cells, index) => {
    const blank = Object.values(cells).every((cell) => (cell ?? '').trim() === '');
    if (blank) blankRows.add(index);
    else rows.push({ line: index + 2, cells });
  });
  return {
    columns: (parsed.meta.fields ?? []).filter((field) => field !== ''),
    rows,
    problems: parsed.errors
      .filter(
        (error) =>
          error.code !== 'UndetectableDelimiter' && !blankRows.has(error.row ?? Number.NaN),
      )
      .map((error) => ({ line: (error.row ?? 0) + 2, reason: error.message })),
  };
}
