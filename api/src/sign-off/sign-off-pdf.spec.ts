import { describeInputs, evaluate, KINDS } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { renderSignOffPdf } from './sign-off-pdf';

describe('renderSignOffPdf', () => {
  it('renders every step of a lift check into a PDF', async () => {
    const inputs = KINDS.find((kind) => kind.id === 'lift-check')?.example;
    const result = evaluate('lift-check', inputs);
    const bytes = await renderSignOffPdf({
      title: 'Sphere',
      kindTitle: 'Lift check',
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
        KINDS.find((kind) => kind.id === 'lift-check')?.inputSchema,
        inputs,
        {
          unitSystem: 'si',
          numberFormat: 'point-comma',
        },
      ),
    });
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    if (process.env.SIGN_OFF_PDF_OUT)
      (await import('node:fs')).writeFileSync(process.env.SIGN_OFF_PDF_OUT, bytes);
  });
});
