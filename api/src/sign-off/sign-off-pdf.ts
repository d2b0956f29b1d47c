import type { InputSection, LiftSweep, NumberFormat, UnitSystem } from '@loftwright/buoyancy';
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { fontRuns, type SheetFont, sheetFonts } from './sheet-fonts';
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

const MARGIN = 50;
const INK = '#000000';
const GREY = '#444444';

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
    `Saved ${utcText(content.savedAt)} by ${content.author}${content.note ? ` — ${content.note}` : ''}`,
    sans,
    10,
  );
  if (content.review) {
    write(
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
  write('Content fingerprint (SHA-256)', sans, 9, { color: GREY, width: textWidth });
  write(groupedFingerprint(content.fingerprint), mono, 10, { width: textWidth });
  doc.moveDown(0.3);
  write('Scan the code or open this address to check the sheet:', sans, 9, {
    color: GREY,
    width: textWidth,
  });
  doc.x = MARGIN;
  doc.y = Math.max(doc.y, blockTop + qrSize + 2);
  write(content.verifyUrl, mono, 8);

  heading('Inputs');
  for (const section of content.inputSections) {
    doc.moveDown(0.2);
    if (section.title) write(section.title, bold, 10);
    for (const line of section.lines) row(line.label, line.text, sans);
  }

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

  const charts = content.charts ?? [];
  if (charts.length > 0) {
    // The heading and its note stay with the first chart.
    if (doc.y + 70 + SWEEP_CHART_HEIGHT > doc.page.height - MARGIN) doc.addPage();
    heading('Charts');
    write(
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
    row('Approved at', approvalMomentText(content.review.decidedAt, content.review.timeZone), sans);
    row('Comment', content.review.comment || '(none)', sans);
  } else {
    write('Not approved: this sheet records the version only.', sans, 10);
  }

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
    // The whole fingerprint on every page, so any one page can be checked on its own.
    doc
      .font(fonts.mono.name)
      .fontSize(7)
      .text(content.fingerprint, MARGIN, bottom + 10, {
        width,
        align: 'center',
        lineBreak: false,
      });
  }
  doc.end();
  return done;
}
