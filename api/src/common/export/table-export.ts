import ExcelJS from 'exceljs';
import type { Response } from 'express';
import Papa from 'papaparse';

export type CellValue = string | number | boolean | Date | null;

/** One column of an exported table: its heading and how to read a row's cell. */
export interface ExportColumn<Row> {
  header: string;
  value: (row: Row) => CellValue;
  /** Spreadsheet column width in characters. */
  width?: number;
}

export const EXPORT_FORMATS = ['csv', 'xlsx'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

/**
 * Text a spreadsheet would run as a formula (=, +, -, @ and the control characters that lead
 * one) gets a leading apostrophe: OWASP's advice against CSV injection. Numbers stay numbers.
 */
function safeText(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

const cell = (value: CellValue): CellValue => (typeof value === 'string' ? safeText(value) : value);

export function tableToCsv<Row>(
  columns: readonly ExportColumn<Row>[],
  rows: readonly Row[],
): string {
  const data = rows.map((row) =>
    columns.map((column) => {
      const value = cell(column.value(row));
      return value instanceof Date ? value.toISOString() : value;
    }),
  );
  // A byte-order mark so spreadsheet programs read the file as UTF-8 (°C, ρ, names).
  return `\uFEFF${Papa.unparse({ fields: columns.map((column) => column.header), data })}\r\n`;
}

export async function tableToXlsx<Row>(
  sheetName: string,
  columns: readonly ExportColumn<Row>[],
  rows: readonly Row[],
): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'Loftwright';
  const sheet = workbook.addWorksheet(sheetName.slice(0, 31), {
    views: [{ state: 'frozen', ySplit: 1 }],
  });
  sheet.columns = columns.map((column) => ({ header: column.header, width: column.width ?? 18 }));
  sheet.getRow(1).font = { bold: true };
  for (const row of rows) sheet.addRow(columns.map((column) => cell(column.value(row))));
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

/** Sends a table as a CSV or XLSX download named `<baseName>.<format>`. */
export async function sendTable<Row>(
  response: Response,
  format: ExportFormat,
  baseName: string,
  columns: readonly ExportColumn<Row>[],
  rows: readonly Row[],
): Promise<void> {
  const fileName = `${baseName}.${format}`;
  response.setHeader('Content-Disposition', `attachment; filename="${fileName}"`);
  response.setHeader('X-Content-Type-Options', 'nosniff');
  if (format === 'csv') {
    response.type('text/csv; charset=utf-8').send(tableToCsv(columns, rows));
    return;
  }
  response
    .type('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet')
    .send(await tableToXlsx(baseName, columns, rows));
}
