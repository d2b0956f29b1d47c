import { fireEvent, screen } from '@testing-library/react';
import { evaluate, normaliseInputs } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { renderInRouter } from '@/testing/test-utils';
import type { CalculationDetail } from '../api/calculations-api';
import { EditorBody } from './calculation-editor';

const inputs = normaliseInputs('lift-check', {
  envelope: { shape: 'sphere', diameterM: 1 },
  envelopeMass: { kind: 'fixed', massKg: 0.1 },
  payloadMassKg: 0.2,
  gas: { gasId: 'hydrogen' },
  ambient: { mode: 'measured', temperatureK: 288.15, pressurePa: 101325 },
}) as Record<string, unknown>;
const stored = evaluate('lift-check', inputs);

const detail: CalculationDetail = {
  id: '00000000-0000-4000-8000-000000000001',
  title: 'Test sphere',
  kind: 'lift-check',
  owner: { id: 'u1', displayName: 'Owner' },
  visibility: 'private',
  tags: [],
  latestVersion: 1,
  status: 'draft',
  archived: false,
  createdAt: '2026-12-01T00:00:00Z',
  updatedAt: '2026-12-01T00:00:00Z',
  versions: [],
  latest: {
    number: 1,
    status: 'draft',
    note: '',
    author: { id: 'u1', displayName: 'Owner' },
    reviewer: null,
    engineVersion: '0.1.0',
    fingerprint: 'f'.repeat(64),
    createdAt: '2026-12-01T00:00:00Z',
    submittedAt: null,
    inputs,
    outputs: stored.outputs,
    steps: stored.steps,
    warnings: stored.warnings,
    series: null,
  },
  permissions: {
    edit: true,
    archive: true,
    submit: true,
    review: false,
    upload: true,
    export: true,
  },
  source: null,
  continuations: [],
  continueAs: [],
};

const renderEditor = () =>
  renderInRouter(<EditorBody detail={detail} refetch={() => undefined} unitSystem="si" />);

describe('the calculation editor', () => {
  it('recomputes the results in the browser as the inputs change, and marks them unsaved', async () => {
    renderEditor();
    const netLift = () => document.querySelector('[data-output="netLift"]')?.textContent ?? '';
    const before = netLift();
    expect(before).toContain('Net lift');
    const diameter = screen.getByLabelText('Diameter', { exact: true });
    fireEvent.change(diameter, { target: { value: '1.2 m' } });
    await screen.findByRole('status', { name: 'Results (live, not saved)' });
    const expected =
      evaluate('lift-check', { ...inputs, envelope: { shape: 'sphere', diameterM: 1.2 } }).outputs
        .netLift?.value ?? 0;
    // Below a kilogram it is shown in grams, to four significant figures.
    expect(netLift()).toContain(`${(expected * 1000).toFixed(1)} g`);
    expect(netLift()).not.toBe(before);
    expect(screen.getByRole('status', { name: 'Results (live, not saved)' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save as version 2' })).toBeEnabled();
  });

  it('shows the hydrogen caution and every step of the derivation', () => {
    renderEditor();
    expect(document.querySelector('[data-warning="flammable-gas"]')?.textContent).toMatch(
      /flammable/,
    );
    expect(screen.getByRole('list', { name: 'Derivation steps' }).children.length).toBe(
      stored.steps.length,
    );
  });
});
