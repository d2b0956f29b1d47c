import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import {
  describeInputs,
  evaluate,
  KINDS,
  liftSweeps,
  normaliseInputs,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { afterAll, describe, expect, it } from 'vitest';
import { renderSignOffPdf, type SignOffContent } from './sign-off-pdf';

const workDir = mkdtempSync(join(tmpdir(), 'loftwright-sheet-'));
afterAll(() => rmSync(workDir, { recursive: true, force: true }));

/** The sheet of a kind's example, approved, with the charts its kind offers. */
function sheetOf(kind: string, unitSystem: UnitSystem = 'si'): SignOffContent {
  const inputs = normaliseInputs(kind, KINDS.find((candidate) => candidate.id === kind)?.example);
  const result = evaluate(kind, inputs);
  const reading = { unitSystem, numberFormat: 'point-comma' } as const;
  return {
    title: 'Sphere',
    kindTitle: KINDS.find((candidate) => candidate.id === kind)?.title ?? kind,
    versionNumber: 2,
    status: 'approved',
    fingerprint: 'a'.repeat(64),
    engineVersion: '0.1.0',
    author: 'A. Designer',
    savedAt: new Date('2026-12-01T10:00:00Z'),
    note: '',
    inputs,
    outputs: result.outputs as never,
    steps: result.steps as never,
    warnings: result.warnings as never,
    review: {
      reviewer: 'R. Checker',
      decidedAt: new Date('2026-12-02T10:00:00Z'),
      comment: 'ok',
    },
    verifyUrl: `https://loft.example.org/verify/${'a'.repeat(64)}`,
    inputSections: describeInputs(
      KINDS.find((candidate) => candidate.id === kind)?.inputSchema,
      inputs,
      reading,
    ),
    charts: liftSweeps(kind, inputs, result.outputs),
    reading,
  };
}

/** The sheet's words as poppler's pdftotext reads them, laid out as on the page. */
function pdfText(bytes: Buffer, name: string): string {
  const file = join(workDir, `${name}.pdf`);
  writeFileSync(file, bytes);
  return execFileSync('pdftotext', ['-layout', file, '-']).toString();
}

describe('renderSignOffPdf', () => {
  it('renders every step of a lift check into a PDF', async () => {
    const bytes = await renderSignOffPdf(sheetOf('lift-check'));
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    if (process.env.SIGN_OFF_PDF_OUT)
      (await import('node:fs')).writeFileSync(process.env.SIGN_OFF_PDF_OUT, bytes);
  });

  it('draws a lift check’s sweeps as charts with titled axes in SI', async () => {
    const text = pdfText(await renderSignOffPdf(sheetOf('lift-check')), 'lift-check');
    expect(text).toContain('Charts');
    for (const title of [
      'Lift against diameter',
      'Lift against air temperature',
      'Lift against gas purity',
    ])
      expect(text).toContain(title);
    // Axis titles with the unit each axis is read in; the legend names what is drawn.
    for (const label of ['Diameter (m)', 'Air temperature (°C)', 'Gas purity (%)'])
      expect(text).toContain(label);
    for (const entry of ['Net lift', 'Free lift', 'Design point']) expect(text).toContain(entry);
    // The example is a 1.2 m sphere: the size axis runs from 0.4× to 2× with round ticks.
    expect(text).toMatch(/0\.5\s+1\.0\s+1\.5\s+2\.0/);
  });

  it('draws the axes in the reader’s units when the sheet carries them', async () => {
    const text = pdfText(await renderSignOffPdf(sheetOf('lift-check', 'us')), 'lift-check-us');
    // 1 ft = 0.3048 m and °F = 1.8·°C + 32 (NIST SP 811, appendix B): the sphere's axis in feet.
    expect(text).toContain('Diameter (ft)');
    expect(text).toContain('Air temperature (°F)');
    expect(text).not.toContain('Diameter (m)');
  });

  it('marks the wanted free lift on a sizing’s chart', async () => {
    const text = pdfText(await renderSignOffPdf(sheetOf('envelope-sizing')), 'sizing');
    expect(text).toContain('Lift against size, around the size found');
    expect(text).toContain('free lift wanted');
  });

  it('draws no charts for a kind without them', async () => {
    const content = sheetOf('ambient-air');
    expect(content.charts).toEqual([]);
    const text = pdfText(await renderSignOffPdf(content), 'ambient-air');
    expect(text).not.toContain('Charts');
    expect(text).toContain('Derivation');
  });
});
