import PDFDocument from 'pdfkit';
import { fontRuns, type SheetFont, sheetFonts } from './sheet-fonts';

/** What the printed sheet shows (docs: ../shared/design.md, "Printed sign-off sheet"). */
export interface SignOffContent {
  title: string;
  kindTitle: string;
  versionNumber: number;
  status: string;
  fingerprint: string;
  engineVersion: string;
  author: string;
  savedAt: Date;
  note: string;
  inputs: unknown;
  outputs: Record<string, { label: string; value: number; unit: string; context?: string }>;
  steps: {
    label: string;
    formula: string;
    values: { symbol: string; value: number; unit: string }[];
    result: { symbol: string; value: number; unit: string };
    source: string;
  }[];
  warnings: { severity: string; message: string }[];
  review?: { reviewer: string; decidedAt: Date; comment: string };
  verifyPath: string;
}

const MARGIN = 50;
const INK = '#000000';
const GREY = '#444444';

const number = (value: number) =>
  Math.abs(value) >= 1e6 || (Math.abs(value) < 1e-3 && value !== 0)
    ? value.toExponential(4)
    : Number(value.toPrecision(6)).toString();

function leaves(value: unknown, prefix = ''): [string, string][] {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    return Object.entries(value).flatMap(([key, child]) =>
      leaves(child, prefix ? `${prefix}.${key}` : key),
    );
  }
  return [[prefix, Array.isArray(value) ? JSON.stringify(value) : String(value)]];
}

/**
 * The sign-off sheet of one version as an A4 PDF, black on white, in the fonts the web app uses,
 * so the archived copy reads like the printed page. Returns the file's bytes.
 */
export function renderSignOffPdf(content: SignOffContent): Promise<Buffer> {
  const fonts = sheetFonts();
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    bufferPages: true,
    info: {
      Title: `${content.title}, version ${content.versionNumber}: sign-off sheet`,
      Author: content.author,
      Subject: `Loftwright calculation, fingerprint ${content.fingerprint}`,
      Creator: 'Loftwright',
    },
  });
  for (const font of Object.values(fonts)) doc.registerFont(font.name, font.bytes);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const sans = [fonts.sans, fonts.greek, fonts.fallbackSans];
  const bold = [fonts.sansBold, fonts.greek, fonts.fallbackSans];
  const mono = [fonts.mono, fonts.fallbackMono];
  const width = doc.page.width - 2 * MARGIN;

  /** Writes a line (or paragraph) of text, switching fonts where a glyph is missing. */
  const write = (
    text: string,
    face: readonly SheetFont[],
    size: number,
    options: PDFKit.Mixins.TextOptions & { color?: string } = {},
  ) => {
    const runs = fontRuns(text === '' ? ' ' : text, face);
    doc.fillColor(options.color ?? INK).fontSize(size);
    runs.forEach((run, index) => {
      doc.font(run.font.name).text(run.text, {
        width: options.width ?? width,
        ...options,
        continued: index < runs.length - 1,
      });
    });
  };
  const heading = (text: string) => {
    doc.moveDown(0.8);
    write(text, bold, 13);
    doc.moveDown(0.3);
  };
  /** Two columns: a label and its value, kept together on one page. */
  const row = (label: string, value: string, valueFace = mono) => {
    const labelWidth = width * 0.5;
    doc.font(fonts.sans.name).fontSize(9);
    const height = Math.max(
      doc.heightOfString(label, { width: labelWidth - 8 }),
      doc.heightOfString(value, { width: width - labelWidth }),
    );
    if (doc.y + height > doc.page.height - MARGIN) doc.addPage();
    const y = doc.y;
    write(label, sans, 9, { width: labelWidth - 8, color: GREY });
    const afterLabel = doc.y;
    doc.y = y;
    doc.x = MARGIN + labelWidth;
    write(value, valueFace, 9, { width: width - labelWidth });
    doc.x = MARGIN;
    doc.y = Math.max(afterLabel, doc.y) + 2;
  };

  write('Loftwright · sign-off sheet', sans, 10, { color: GREY });
  doc.moveDown(0.3);
  write(content.title, bold, 18);
  doc.moveDown(0.2);
  write(
    `${content.kindTitle} · version ${content.versionNumber} · ${content.status} · engine ${content.engineVersion}`,
    sans,
    10,
  );
  write(
    `Saved ${content.savedAt.toISOString()} by ${content.author}${content.note ? ` — ${content.note}` : ''}`,
    sans,
    10,
  );
  doc.moveDown(0.3);
  write('Content fingerprint (SHA-256)', sans, 9, { color: GREY });
  write(content.fingerprint, mono, 9);
  write(`Check it at ${content.verifyPath}`, sans, 9, { color: GREY });

  heading('Inputs');
  for (const [path, value] of leaves(content.inputs)) row(path, value);

  heading('Results');
  for (const output of Object.values(content.outputs)) {
    row(
      output.label,
      `${number(output.value)} ${output.unit}${output.context ? `  (${output.context})` : ''}`,
    );
  }

  if (content.warnings.length > 0) {
    heading('Cautions and warnings');
    for (const warning of content.warnings) {
      write(
        `${warning.severity === 'caution' ? 'Caution' : warning.severity === 'warning' ? 'Check this' : 'Note'}: ${warning.message}`,
        sans,
        9,
      );
      doc.moveDown(0.3);
    }
  }

  heading('Derivation');
  content.steps.forEach((step, index) => {
    if (doc.y > doc.page.height - MARGIN - 60) doc.addPage();
    write(`${index + 1}. ${step.label}`, bold, 9.5);
    write(step.formula, mono, 9);
    if (step.values.length > 0) {
      write(
        step.values
          .map((value) => `${value.symbol} = ${number(value.value)} ${value.unit}`)
          .join(', '),
        mono,
        8,
        { color: GREY },
      );
    }
    write(`→ ${step.result.symbol} = ${number(step.result.value)} ${step.result.unit}`, mono, 9);
    write(step.source, sans, 8, { color: GREY });
    doc.moveDown(0.4);
  });

  heading('Review');
  if (content.review) {
    row('Approved by', content.review.reviewer, sans);
    row('Approved at', content.review.decidedAt.toISOString(), sans);
    row('Comment', content.review.comment || '(none)', sans);
  } else {
    write('Not approved: this sheet records the version only.', sans, 10);
  }

  const range = doc.bufferedPageRange();
  for (let page = range.start; page < range.start + range.count; page += 1) {
    doc.switchToPage(page);
    const bottom = doc.page.height - MARGIN / 2 - 8;
    doc.page.margins.bottom = 0;
    doc
      .font(fonts.sans.name)
      .fontSize(8)
      .fillColor(GREY)
      .text(
        `${content.title} · v${content.versionNumber} · ${content.fingerprint.slice(0, 16)}… · page ${page + 1} of ${range.count}`,
        MARGIN,
        bottom,
        { width, align: 'center', lineBreak: false },
      );
  }
  doc.end();
  return done;
}
