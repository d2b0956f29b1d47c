import type { InputSection, LiftSweep, NumberFormat, UnitSystem } from '@loftwright/buoyancy';
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { sheetFonts } from './sheet-fonts';
import { GREY, MARGIN, SheetWriter } from './sheet-writer';
import { drawSweepCharts, SWEEP_CHART_HEIGHT } from './sweep-chart-pdf';

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
  /** The inputs as the editor shows them (labels, sections, units); engine describeInputs. */
  inputSections: InputSection[];
  outputs: Record<string, { label: string; value: number; unit: string; context?: string }>;
  steps: readonly {
    label: string;
    formula: string;
    values: readonly { symbol: string; value: number; unit: string }[];
    result: { symbol: string; value: number; unit: string };
    source: string;
  }[];
  warnings: readonly { severity: string; message: string }[];
  /** The approval; `timeZone` the approver's (IANA), when their browser said it. */
  review?: { reviewer: string; decidedAt: Date; comment: string; timeZone?: string };
  /** The verify page of the fingerprint, with host; printed and drawn as a QR code. */
  verifyUrl: string;
  /** Lift sweeps of the kinds that chart them (engine liftSweeps), drawn as line charts. */
  charts?: LiftSweep[];
  /** The reader's units and number format for the charts; SI and 1,234.5 when not given. */
  reading?: { unitSystem: UnitSystem; numberFormat: NumberFormat };
}

const number = (value: number) =>
  Math.abs(value) >= 1e6 || (Math.abs(value) < 1e-3 && value !== 0)
    ? value.toExponential(4)
    : Number(value.toPrecision(6)).toString();

/** "4 December 2026, 01:52 UTC": a moment as a person reads it, in UTC (the archive's zone). */
export function utcText(moment: Date): string {
  return `${new Intl.DateTimeFormat('en-GB', {
    dateStyle: 'long',
    timeStyle: 'short',
    timeZone: 'UTC',
  }).format(moment)} UTC`;
}

/**
 * "4 December 2026 at 02:10 GMT+1 (Europe/Berlin), 01:10 UTC": the approval in the approver's
 * zone with its offset, and in UTC; UTC alone when the zone is not known.
 */
export function approvalMomentText(moment: Date, timeZone?: string): string {
  if (!timeZone) return utcText(moment);
  const local = new Intl.DateTimeFormat('en-GB', {
    year: 'numeric',
    month: 'long',
    day: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    timeZone,
    timeZoneName: 'shortOffset',
  }).format(moment);
  const utcTime = new Intl.DateTimeFormat('en-GB', {
    hour: '2-digit',
    minute: '2-digit',
    timeZone: 'UTC',
  }).format(moment);
  return `${local} (${timeZone}), ${utcTime} UTC`;
}

/** A 64-character fingerprint in four groups of 16, so a printed copy is read without losing place. */
export const groupedFingerprint = (fingerprint: string): string =>
  fingerprint.match(/.{1,16}/g)?.join(' ') ?? fingerprint;

/**
 * The sign-off sheet of one version as an A4 PDF, black on white, in the fonts the web app uses,
 * so the archived copy reads like the printed page. Returns the file's bytes.
 */
export async function renderSignOffPdf(content: SignOffContent): Promise<Buffer> {
  const qrPng = await QRCode.toBuffer(content.verifyUrl, {
    type: 'png',
    errorCorrectionLevel: 'M',
    margin: 2,
    scale: 6,
  });
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

  const sheet = new SheetWriter(doc, fonts);
  writeTitleBlock(sheet, content, qrPng);
  writeInputs(sheet, content);
  writeResults(sheet, content);
  writeWarnings(sheet, content);
  writeCharts(sheet, content);
  writeDerivation(sheet, content);
  writeReview(sheet, content);
  writePageFooters(sheet, content);
  doc.end();
  return done;
}

/** Title, version and approval lines, the fingerprint beside the verify QR code, and its address. */
function writeTitleBlock(sheet: SheetWriter, content: SignOffContent, qrPng: Buffer): void {
  const { doc, sans, bold, mono, width } = sheet;
  sheet.write('Loftwright · sign-off sheet', sans, 10, { color: GREY });
  doc.moveDown(0.3);
  sheet.write(content.title, bold, 18);
  doc.moveDown(0.2);
  sheet.write(
    `${content.kindTitle} · version ${content.versionNumber} · ${content.status} · engine ${content.engineVersion}`,
    sans,
    10,
  );
  sheet.write(
    `Saved ${utcText(content.savedAt)} by ${content.author}${content.note ? ` — ${content.note}` : ''}`,
    sans,
    10,
  );
  if (content.review) {
    sheet.write(
      `Approved ${approvalMomentText(content.review.decidedAt, content.review.timeZone)} by ${content.review.reviewer}`,
      bold,
      10,
    );
  }
  doc.moveDown(0.3);
  // The QR code of the verify page sits right of the fingerprint; the URL runs the full width
  // below, so a long host does not break it across lines.
  const qrSize = 84;
  const blockTop = doc.y;
  doc.image(qrPng, MARGIN + width - qrSize, blockTop, { width: qrSize, height: qrSize });
  const textWidth = width - qrSize - 12;
  sheet.write('Content fingerprint (SHA-256)', sans, 9, { color: GREY, width: textWidth });
  sheet.write(groupedFingerprint(content.fingerprint), mono, 10, { width: textWidth });
  doc.moveDown(0.3);
  sheet.write('Scan the code or open this address to check the sheet:', sans, 9, {
    color: GREY,
    width: textWidth,
  });
  doc.x = MARGIN;
  doc.y = Math.max(doc.y, blockTop + qrSize + 2);
  sheet.write(content.verifyUrl, mono, 8);
}

function writeInputs(sheet: SheetWriter, content: SignOffContent): void {
  sheet.heading('Inputs');
  for (const section of content.inputSections) {
    sheet.doc.moveDown(0.2);
    if (section.title) sheet.write(section.title, sheet.bold, 10);
    for (const line of section.lines) sheet.row(line.label, line.text, sheet.sans);
  }
}

function writeResults(sheet: SheetWriter, content: SignOffContent): void {
  sheet.heading('Results');
  for (const output of Object.values(content.outputs)) {
    sheet.row(
      output.label,
      `${number(output.value)} ${output.unit}${output.context ? `  (${output.context})` : ''}`,
    );
  }
}

const WARNING_WORDS: Record<string, string> = { caution: 'Caution', warning: 'Check this' };

function writeWarnings(sheet: SheetWriter, content: SignOffContent): void {
  if (content.warnings.length === 0) return;
  sheet.heading('Cautions and warnings');
  for (const warning of content.warnings) {
    sheet.write(`${WARNING_WORDS[warning.severity] ?? 'Note'}: ${warning.message}`, sheet.sans, 9);
    sheet.doc.moveDown(0.3);
  }
}

function writeCharts(sheet: SheetWriter, content: SignOffContent): void {
  const charts = content.charts ?? [];
  if (charts.length === 0) return;
  const { doc, sans, bold, width } = sheet;
  // The heading and its note stay with the first chart.
  sheet.keepRoom(70 + SWEEP_CHART_HEIGHT);
  sheet.heading('Charts');
  sheet.write(
    'Net and free lift as one input changes, every other input as above; the dot is this version.',
    sans,
    9,
    { color: GREY },
  );
  doc.moveDown(0.6);
  drawSweepCharts(
    doc,
    charts,
    { left: MARGIN, width, bottom: doc.page.height - MARGIN },
    content.reading ?? { unitSystem: 'si', numberFormat: 'point-comma' },
    { sans, bold },
  );
}

function writeDerivation(sheet: SheetWriter, content: SignOffContent): void {
  const { doc, sans, bold, mono } = sheet;
  sheet.heading('Derivation');
  content.steps.forEach((step, index) => {
    sheet.keepRoom(60);
    sheet.write(`${index + 1}. ${step.label}`, bold, 9.5);
    sheet.write(step.formula, mono, 9);
    if (step.values.length > 0) {
      sheet.write(
        step.values
          .map((value) => `${value.symbol} = ${number(value.value)} ${value.unit}`)
          .join(', '),
        mono,
        8,
        { color: GREY },
      );
    }
    sheet.write(
      `→ ${step.result.symbol} = ${number(step.result.value)} ${step.result.unit}`,
      mono,
      9,
    );
    sheet.write(step.source, sans, 8, { color: GREY });
    doc.moveDown(0.4);
  });
}

function writeReview(sheet: SheetWriter, content: SignOffContent): void {
  sheet.heading('Review');
  if (!content.review) {
    sheet.write('Not approved: this sheet records the version only.', sheet.sans, 10);
    return;
  }
  const { review } = content;
  sheet.row('Approved by', review.reviewer, sheet.sans);
  sheet.row('Approved at', approvalMomentText(review.decidedAt, review.timeZone), sheet.sans);
  sheet.row('Comment', review.comment || '(none)', sheet.sans);
}

/** Title, version and page on every page, and the whole fingerprint, so any page checks alone. */
function writePageFooters(sheet: SheetWriter, content: SignOffContent): void {
  const { doc, fonts, width } = sheet;
  const range = doc.bufferedPageRange();
  for (let page = range.start; page < range.start + range.count; page += 1) {
    doc.switchToPage(page);
    const bottom = doc.page.height - MARGIN / 2 - 14;
    doc.page.margins.bottom = 0;
    doc
      .font(fonts.sans.name)
      .fontSize(8)
      .fillColor(GREY)
      .text(
        `${content.title} · version ${content.versionNumber} · page ${page + 1} of ${range.count}`,
        MARGIN,
        bottom,
        { width, align: 'center', lineBreak: false },
      );
    doc
      .font(fonts.mono.name)
      .fontSize(7)
      .text(content.fingerprint, MARGIN, bottom + 10, {
        width,
        align: 'center',
        lineBreak: false,
      });
  }
}
