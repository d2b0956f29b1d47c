import { fontRuns, type SheetFont, type SheetFonts } from './sheet-fonts';

export const MARGIN = 50;
export const INK = '#000000';
export const GREY = '#444444';

/**
 * Writes the sheet's text into a pdfkit document: lines that switch fonts where a glyph is
 * missing, section headings, and label–value rows kept whole on a page.
 */
export class SheetWriter {
  readonly sans: readonly SheetFont[];
  readonly bold: readonly SheetFont[];
  readonly mono: readonly SheetFont[];
  /** Width of the text column between the margins. */
  readonly width: number;

  constructor(
    readonly doc: PDFKit.PDFDocument,
    readonly fonts: SheetFonts,
  ) {
    this.sans = [fonts.sans, fonts.greek, fonts.fallbackSans];
    this.bold = [fonts.sansBold, fonts.greek, fonts.fallbackSans];
    this.mono = [fonts.mono, fonts.fallbackMono];
    this.width = doc.page.width - 2 * MARGIN;
  }

  /** Writes a line (or paragraph) of text, switching fonts where a glyph is missing. */
  write(
    text: string,
    face: readonly SheetFont[],
    size: number,
    options: PDFKit.Mixins.TextOptions & { color?: string } = {},
  ): void {
    const runs = fontRuns(text === '' ? ' ' : text, face);
    this.doc.fillColor(options.color ?? INK).fontSize(size);
    runs.forEach((run, index) => {
      this.doc.font(run.font.name).text(run.text, {
        width: options.width ?? this.width,
        ...options,
        continued: index < runs.length - 1,
      });
    });
  }

  heading(text: string): void {
    this.doc.moveDown(0.8);
    this.write(text, this.bold, 13);
    this.doc.moveDown(0.3);
  }

  /** Two columns: a label and its value, kept together on one page. */
  row(label: string, value: string, valueFace: readonly SheetFont[] = this.mono): void {
    const { doc, width } = this;
    const labelWidth = width * 0.5;
    doc.font(this.fonts.sans.name).fontSize(9);
    const height = Math.max(
      doc.heightOfString(label, { width: labelWidth - 8 }),
      doc.heightOfString(value, { width: width - labelWidth }),
    );
    if (doc.y + height > doc.page.height - MARGIN) doc.addPage();
    const y = doc.y;
    this.write(label, this.sans, 9, { width: labelWidth - 8, color: GREY });
    const afterLabel = doc.y;
    doc.y = y;
    doc.x = MARGIN + labelWidth;
    this.write(value, valueFace, 9, { width: width - labelWidth });
    doc.x = MARGIN;
    doc.y = Math.max(afterLabel, doc.y) + 2;
  }

  /** Starts a new page when fewer than `heightPt` points are left above the bottom margin. */
  keepRoom(heightPt: number): void {
    if (this.doc.y + heightPt > this.doc.page.height - MARGIN) this.doc.addPage();
  }
}
