import { readFileSync } from 'node:fs';

/**
 * Reads one of the reference tables in test/reference/data: a header line, then comma-separated
 * rows. Only the last column may contain commas (it holds the source text). Empty cells are
 * `undefined`.
 */
export function readReferenceTable(url: URL): Record<string, string | undefined>[] {
  const [header, ...lines] = readFileSync(url, 'utf8')
    .split('\n')
    .map((line) => line.trim())
    .filter((line) => line.length > 0 && !line.startsWith('#'));
  if (!header) throw new Error(`${url.pathname} is empty`);
  const columns = header.split(',');
  return lines.map((line) => {
    const cells = line.split(',');
    const fixed = cells.slice(0, columns.length - 1);
    const last = cells.slice(columns.length - 1).join(',');
    return Object.fromEntries(
      [...fixed, last].map((cell, index) => [columns[index], cell === '' ? undefined : cell]),
    );
  });
}

export function numberCell(row: Record<string, string | undefined>, column: string): number {
  const cell = row[column];
  const value = Number(cell);
  if (cell === undefined || !Number.isFinite(value)) {
    throw new Error(`Column ${column} is not a number in row ${JSON.stringify(row)}`);
  }
  return value;
}
