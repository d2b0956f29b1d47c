import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { evaluate, KINDS, normaliseInputs } from '@loftwright/buoyancy';
import { afterAll, describe, expect, it } from 'vitest';
import type { AttachmentsService } from '../attachments/attachments.service';
import type { CalculationVersion } from '../calculations/calculation-version.entity';
import type { Calculation } from '../calculations/calculation.entity';
import { SignOffService } from './sign-off.service';

const workDir = mkdtempSync(join(tmpdir(), 'loftwright-sign-off-'));
afterAll(() => rmSync(workDir, { recursive: true, force: true }));

/** Archives the sheet of a kind's example, keeping the bytes the attachment store was given. */
async function archivedSheet(kind: string): Promise<string> {
  const stored: Buffer[] = [];
  const attachments = {
    storeGenerated: async (_actor: string | null, _id: string, bytes: Buffer) => {
      stored.push(bytes);
      return {} as never;
    },
  } as unknown as AttachmentsService;
  const inputs = normaliseInputs(kind, KINDS.find((candidate) => candidate.id === kind)?.example);
  const result = evaluate(kind, inputs);
  const version = {
    number: 3,
    fingerprint: 'c'.repeat(64),
    engineVersion: '0.1.0',
    createdAt: new Date('2026-12-01T10:00:00Z'),
    note: '',
    inputs,
    outputs: result.outputs,
    steps: result.steps,
    warnings: result.warnings,
  } as unknown as CalculationVersion;
  const calculation = { id: 'calc-1', title: 'Harbour sphere', kind } as Calculation;
  const archived = await new SignOffService(attachments).archiveApproved(
    calculation,
    version,
    { author: 'A. Designer', reviewerId: 'reviewer-1', reviewer: 'R. Checker' },
    'Looks right.',
    new Date('2026-12-02T10:00:00Z'),
    `https://loft.example.org/verify/${'c'.repeat(64)}`,
  );
  expect(archived).toBeDefined();
  const [bytes] = stored;
  if (!bytes) throw new Error('no sheet stored');
  const file = join(workDir, `${kind}.pdf`);
  writeFileSync(file, bytes);
  return execFileSync('pdftotext', ['-layout', file, '-']).toString();
}

describe('SignOffService', () => {
  it('puts the lift sweeps of a lift-check version on its archived sheet, in SI', async () => {
    const text = await archivedSheet('lift-check');
    expect(text).toContain('Lift against diameter');
    expect(text).toContain('Diameter (m)');
    expect(text).toContain('Air temperature (°C)');
  });

  it('leaves charts off the sheet of a kind that has none', async () => {
    const text = await archivedSheet('gas-supply');
    expect(text).not.toContain('Charts');
  });
});
