import {
  formatNumber,
  type LiftSweep,
  type NumberFormat,
  sweepPlot,
  type SweepPlot,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { fontRuns, type SheetFont } from './sheet-fonts';

const INK = '#000000';
const GREY = '#555555';
const GRID = '#C8C8C8';

/** Room a chart takes on the sheet, from its title to its x-axis title [pt]. */
export const SWEEP_CHART_HEIGHT = 180;

/** Plot area inside the chart's box: room on the left for tick labels and the lift axis title. */
const LAYOUT = {
  titleHeight: 14,
  legendHeight: 14,
  plotLeft: 50,
  plotRight: 10,
  plotHeight: 114,
  tickLength: 3,
} as const;

/** How the chart writes its numbers and whose units it uses. */
export interface ChartReading {
  unitSystem: UnitSystem;
  numberFormat: NumberFormat;
}

/** The sheet's faces, each a list to fall back through where a glyph is missing. */
export interface ChartFaces {
  sans: readonly SheetFont[];
  bold: readonly SheetFont[];
}

interface Frame {
  left: number;
  top: number;
  width: number;
  height: number;
  /** Page coordinates of a point in the axes' units. */
  at(x: number, y: number): [number, number];
}

/**
 * Draws one lift sweep as a vector line chart at (`left`, `top`), `width` wide and
 * SWEEP_CHART_HEIGHT high, black on white: net lift solid, free lift dashed, zero lift a rule,
 * the wanted free lift dotted, and the design point a dot with dashed guides to both axes.
 * Axes carry round ticks and quantity with unit, as the web's chart does (engine `sweepPlot`).
 * @returns false, drawing nothing, when the sweep has too few points for a curve
 */
export function drawSweepChart(
  doc: PDFKit.PDFDocument,
  sweep: LiftSweep,
  box: { left: number; top: number; width: number },
  reading: ChartReading,
  faces: ChartFaces,
): boolean {
  const plot = sweepPlot(sweep, reading.unitSystem);
  if (!plot) return false;
  const frame = plotFrame(plot, box);
  const text = (label: string, x: number, y: number, options: TextPlacement) =>
    placeText(doc, label, x, y, options);
  text(sweep.title, box.left, box.top, { faces: faces.bold, size: 10 });
  drawLegend(doc, plot, box.left, box.top + LAYOUT.titleHeight, faces);
  drawGrid(doc, plot, frame);
  doc.save();
  doc.rect(frame.left, frame.top, frame.width, frame.height).clip();
  drawReferenceLines(doc, plot, frame, faces);
  drawCurves(doc, plot, frame);
  drawDesignPoint(doc, plot, frame);
  doc.restore();
  drawAxes(doc, plot, frame, reading, faces);
  doc.fillColor(INK).strokeColor(INK).lineWidth(1).undash();
  return true;
}

/**
 * Draws the sweeps one under another from the document's current position, each kept whole on
 * a page (a new page where the rest of this one is too short), and leaves the position below
 * the last.
 */
export function drawSweepCharts(
  doc: PDFKit.PDFDocument,
  sweeps: readonly LiftSweep[],
  column: { left: number; width: number; bottom: number },
  reading: ChartReading,
  faces: ChartFaces,
): void {
  for (const sweep of sweeps) {
    if (doc.y + SWEEP_CHART_HEIGHT > column.bottom) doc.addPage();
    const top = doc.y;
    const drawn = drawSweepChart(doc, sweep, { ...column, top }, reading, faces);
    doc.x = column.left;
    doc.y = drawn ? top + SWEEP_CHART_HEIGHT + 10 : top;
  }
}

function plotFrame(plot: SweepPlot, box: { left: number; top: number; width: number }): Frame {
  const left = box.left + LAYOUT.plotLeft;
  const top = box.top + LAYOUT.titleHeight + LAYOUT.legendHeight + 4;
  const width = box.width - LAYOUT.plotLeft - LAYOUT.plotRight;
  const height = LAYOUT.plotHeight;
  const [x0, x1] = plot.x.domain;
  const [y0, y1] = plot.y.domain;
  return {
    left,
    top,
    width,
    height,
    at: (x, y) => [
      left + ((x - x0) / (x1 - x0 || 1)) * width,
      top + height - ((y - y0) / (y1 - y0 || 1)) * height,
    ],
  };
}

/** Line samples and names of what the chart draws, in one row under its title. */
function drawLegend(
  doc: PDFKit.PDFDocument,
  plot: SweepPlot,
  left: number,
  top: number,
  faces: ChartFaces,
): void {
  const items: { name: string; draw: (x: number, y: number) => void }[] = [
    {
      name: 'Net lift',
      draw: (x, y) =>
        line(
          doc,
          [
            [x, y],
            [x + 18, y],
          ],
          { width: 1.4 },
        ),
    },
    {
      name: 'Free lift',
      draw: (x, y) =>
        line(
          doc,
          [
            [x, y],
            [x + 18, y],
          ],
          { width: 1, dash: [4, 2] },
        ),
    },
    { name: 'Design point', draw: (x, y) => dot(doc, x + 9, y) },
    ...(plot.target === undefined
      ? []
      : [
          {
            name: 'Free lift wanted',
            draw: (x: number, y: number) =>
              line(
                doc,
                [
                  [x, y],
                  [x + 18, y],
                ],
                { width: 0.8, dash: [1, 2], color: GREY },
              ),
          },
        ]),
  ];
  let x = left;
  for (const item of items) {
    item.draw(x, top + 4);
    x += 22;
    x += placeText(doc, item.name, x, top, { faces: faces.sans, size: 7.5, color: GREY }) + 14;
  }
}

function drawGrid(doc: PDFKit.PDFDocument, plot: SweepPlot, frame: Frame): void {
  for (const tick of plot.y.ticks) {
    const [, y] = frame.at(plot.x.domain[0], tick);
    line(
      doc,
      [
        [frame.left, y],
        [frame.left + frame.width, y],
      ],
      { width: 0.4, color: GRID },
    );
  }
  for (const tick of plot.x.ticks) {
    const [x] = frame.at(tick, plot.y.domain[0]);
    line(
      doc,
      [
        [x, frame.top],
        [x, frame.top + frame.height],
      ],
      { width: 0.4, color: GRID },
    );
  }
}

/** Zero lift (below it the balloon does not rise) and the free lift a sizing asks for. */
function drawReferenceLines(
  doc: PDFKit.PDFDocument,
  plot: SweepPlot,
  frame: Frame,
  faces: ChartFaces,
): void {
  const right = frame.left + frame.width;
  const [, zeroY] = frame.at(plot.x.domain[0], 0);
  line(
    doc,
    [
      [frame.left, zeroY],
      [right, zeroY],
    ],
    { width: 0.8 },
  );
  if (plot.target === undefined) return;
  const [, targetY] = frame.at(plot.x.domain[0], plot.target);
  line(
    doc,
    [
      [frame.left, targetY],
      [right, targetY],
    ],
    { width: 0.8, dash: [1, 2], color: GREY },
  );
  placeText(doc, 'free lift wanted', right - 3, targetY - 9, {
    faces: faces.sans,
    size: 7,
    color: GREY,
    align: 'right',
  });
}

function drawCurves(doc: PDFKit.PDFDocument, plot: SweepPlot, frame: Frame): void {
  line(
    doc,
    plot.points.map((point) => frame.at(point.x, point.net)),
    { width: 1.4 },
  );
  line(
    doc,
    plot.points.map((point) => frame.at(point.x, point.free)),
    { width: 1, dash: [4, 2] },
  );
}

/** The design point with dashed guides down to the x axis and across to the lift axis. */
function drawDesignPoint(doc: PDFKit.PDFDocument, plot: SweepPlot, frame: Frame): void {
  const [x, y] = frame.at(plot.design.x, plot.design.y);
  const guide: LineStyle = { width: 0.6, dash: [3, 2], color: GREY };
  line(
    doc,
    [
      [x, frame.top + frame.height],
      [x, y],
    ],
    guide,
  );
  line(
    doc,
    [
      [frame.left, y],
      [x, y],
    ],
    guide,
  );
  dot(doc, x, y);
}

/** Axis lines, tick marks, tick numbers in the reader's format, and the axis titles. */
function drawAxes(
  doc: PDFKit.PDFDocument,
  plot: SweepPlot,
  frame: Frame,
  reading: ChartReading,
  faces: ChartFaces,
): void {
  const bottom = frame.top + frame.height;
  const tick = LAYOUT.tickLength;
  const small = { faces: faces.sans, size: 7.5 };
  line(
    doc,
    [
      [frame.left, frame.top],
      [frame.left, bottom],
      [frame.left + frame.width, bottom],
    ],
    {
      width: 0.8,
    },
  );
  for (const value of plot.y.ticks) {
    const [, y] = frame.at(plot.x.domain[0], value);
    line(
      doc,
      [
        [frame.left - tick, y],
        [frame.left, y],
      ],
      { width: 0.8 },
    );
    const label = formatNumber(value, reading.numberFormat, { decimals: plot.y.decimals });
    placeText(doc, label, frame.left - tick - 2, y - 4, { ...small, align: 'right' });
  }
  for (const value of plot.x.ticks) {
    const [x] = frame.at(value, plot.y.domain[0]);
    line(
      doc,
      [
        [x, bottom],
        [x, bottom + tick],
      ],
      { width: 0.8 },
    );
    const label = formatNumber(value, reading.numberFormat, { decimals: plot.x.decimals });
    placeText(doc, label, x, bottom + tick + 2, { ...small, align: 'center' });
  }
  placeText(doc, plot.x.label, frame.left + frame.width / 2, bottom + 18, {
    faces: faces.sans,
    size: 8.5,
    align: 'center',
  });
  // The lift axis title reads upwards along the axis.
  const centreX = frame.left - LAYOUT.plotLeft + 8;
  const centreY = frame.top + frame.height / 2;
  doc.save();
  doc.rotate(-90, { origin: [centreX, centreY] });
  placeText(doc, plot.y.label, centreX, centreY - 4, {
    faces: faces.sans,
    size: 8.5,
    align: 'center',
  });
  doc.restore();
}

interface LineStyle {
  width: number;
  /** Dash and gap lengths [pt]; solid when left out. */
  dash?: [number, number];
  color?: string;
}

function line(
  doc: PDFKit.PDFDocument,
  points: readonly (readonly [number, number] | number[])[],
  style: LineStyle,
): void {
  const [first, ...rest] = points;
  if (!first || rest.length === 0) return;
  doc.save();
  doc.lineWidth(style.width).strokeColor(style.color ?? INK);
  doc.lineJoin('round');
  if (style.dash) doc.dash(style.dash[0], { space: style.dash[1] });
  doc.moveTo(first[0] ?? 0, first[1] ?? 0);
  for (const point of rest) doc.lineTo(point[0] ?? 0, point[1] ?? 0);
  doc.stroke();
  doc.restore();
}

function dot(doc: PDFKit.PDFDocument, x: number, y: number): void {
  doc.save();
  doc.circle(x, y, 3).lineWidth(1).fillAndStroke(INK, '#FFFFFF');
  doc.restore();
}

interface TextPlacement {
  faces: readonly SheetFont[];
  size: number;
  color?: string;
  /** Where `x` is: the text's start (default), centre or end. */
  align?: 'left' | 'center' | 'right';
}

/**
 * One line of text at a point, switching fonts where a glyph is missing (°, ³, −), never
 * wrapping or breaking the page. @returns its width [pt]
 */
function placeText(
  doc: PDFKit.PDFDocument,
  text: string,
  x: number,
  y: number,
  placement: TextPlacement,
): number {
  const runs = fontRuns(text, placement.faces);
  doc.fontSize(placement.size);
  const widths = runs.map((run) => doc.font(run.font.name).widthOfString(run.text));
  const total = widths.reduce((sum, width) => sum + width, 0);
  let cursor =
    placement.align === 'center' ? x - total / 2 : placement.align === 'right' ? x - total : x;
  doc.fillColor(placement.color ?? INK);
  runs.forEach((run, index) => {
    doc.font(run.font.name).text(run.text, cursor, y, { lineBreak: false });
    cursor += widths[index] ?? 0;
  });
  return total;
}
