import { fireEvent, screen, within } from '@testing-library/react';
import { continueInputs, evaluate, normaliseInputs } from '@loftwright/buoyancy';
import type { AxiosAdapter } from 'axios';
import { afterEach, describe, expect, it } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderInRouter } from '@/testing/test-utils';
import type { CalculationDetail, VersionDetail } from '../api/calculations-api';
import { EditorBody } from './calculation-editor';

const SIZING_ID = '00000000-0000-4000-8000-0000000000a1';

const sizingInputs = (payloadMassKg: number) =>
  normaliseInputs('envelope-sizing', {
    shape: { shape: 'sphere' },
    envelopeMass: { kind: 'fixed', massKg: 0.6 },
    payloadMassKg,
    target: { kind: 'freeLift', freeLiftKg: 0.3 },
    gas: { gasId: 'helium' },
    ambient: { mode: 'standard', altitudeM: 120 },
  }) as Record<string, unknown>;

const savedVersion = (number: number, kind: string, inputs: Record<string, unknown>) => {
  const result = evaluate(kind, inputs);
  return {
    number,
    status: 'draft',
    note: '',
    author: { id: 'u1', displayName: 'Owner' },
    reviewer: null,
    engineVersion: '0.10.0',
    fingerprint: 'f'.repeat(64),
    createdAt: '2026-12-01T00:00:00Z',
    submittedAt: null,
    inputs,
    outputs: result.outputs,
    steps: result.steps,
    warnings: result.warnings,
    series: null,
  } satisfies VersionDetail;
};

const sizingV1 = savedVersion(1, 'envelope-sizing', sizingInputs(0.9));
const sizingV2 = savedVersion(2, 'envelope-sizing', sizingInputs(1.2));
const flightInputs = continueInputs(
  'envelope-sizing',
  'flight-profile',
  sizingV1.inputs,
  sizingV1.outputs,
).inputs;

const detail: CalculationDetail = {
  id: '00000000-0000-4000-8000-0000000000b2',
  title: 'Spring pod → Flight profile',
  kind: 'flight-profile',
  owner: { id: 'u1', displayName: 'Owner' },
  visibility: 'private',
  tags: [],
  latestVersion: 1,
  status: 'draft',
  archived: false,
  createdAt: '2026-12-01T00:00:00Z',
  updatedAt: '2026-12-01T00:00:00Z',
  versions: [],
  latest: savedVersion(1, 'flight-profile', flightInputs),
  permissions: {
    edit: true,
    archive: true,
    submit: true,
    review: false,
    upload: true,
    export: true,
  },
  source: {
    calculationId: SIZING_ID,
    title: 'Spring pod',
    kind: 'envelope-sizing',
    versionNumber: 1,
    newestVersionNumber: 2,
    needs: ['envelope.burstDiameterM'],
  },
  continuations: [],
  continueAs: [{ toKind: 'balloon-rules', title: 'Balloon rules check' }],
};

// The request goes through the real API client; only the transport answers as the API would.
const realAdapter = apiClient.defaults.adapter;
const requested: string[] = [];
const answerSourceVersion: AxiosAdapter = async (config) => {
  requested.push(config.url ?? '');
  return { data: sizingV2, status: 200, statusText: 'OK', headers: {}, config };
};
afterEach(() => {
  apiClient.defaults.adapter = realAdapter;
});

describe('a continued calculation whose source has a newer version', () => {
  it('offers to take it, and puts the re-mapped fields into the form without saving', async () => {
    apiClient.defaults.adapter = answerSourceVersion;
    renderInRouter(<EditorBody detail={detail} refetch={() => undefined} unitSystem="si" />);
    const linked = screen.getByRole('region', { name: 'Linked' });
    expect(within(linked).getByText(/Still to fill: .*burst/i)).toBeInTheDocument();
    expect(
      within(linked).getByText(
        '“Spring pod” has a newer version: 2. This was built from version 1.',
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Continue as balloon rules check' })).toBeEnabled();
    const payload = screen.getByLabelText('Payload, parachute and line', { exact: true });
    const diameter = screen.getByLabelText('Diameter when filled, at launch', { exact: true });
    const diameterBefore = (diameter as HTMLInputElement).value;
    // Below a kilogram the form shows grams.
    expect((payload as HTMLInputElement).value).toBe('900 g');

    fireEvent.click(within(linked).getByRole('button', { name: 'Take version 2' }));

    await within(linked).findByText('Version 2 of “Spring pod” is in the form, not saved yet.');
    expect(requested).toEqual([`/calculations/${SIZING_ID}/versions/2`]);
    expect((payload as HTMLInputElement).value).toBe('1.2 kg');
    // The sizing of a heavier payload needs a bigger sphere: the launch diameter moves with it.
    const newDiameterM = sizingV2.outputs.size?.value ?? Number.NaN;
    expect(newDiameterM).toBeGreaterThan(sizingV1.outputs.size?.value ?? Number.NaN);
    expect((diameter as HTMLInputElement).value).not.toBe(diameterBefore);
    expect(
      within(linked).getByText(
        'Changed: Diameter when filled, at launch, Payload, parachute and line. Check them, then save a version to record it.',
      ),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save as version 2' })).toBeEnabled();
  });
});
