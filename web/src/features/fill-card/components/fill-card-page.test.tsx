import { evaluate, normaliseInputs } from '@loftwright/buoyancy';
import type { VersionDetail } from '@loftwright/contract';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { AxiosAdapter } from 'axios';
import { afterEach, describe, expect, it } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderInRouter } from '@/testing/test-utils';
import { FillCardPage } from './fill-card-page';

const CALCULATION_ID = '00000000-0000-4000-8000-0000000000c3';

/** A helium sphere sized for 0.5 kg of payload and 0.25 kg of free lift. */
const inputs = normaliseInputs('envelope-sizing', {
  shape: { shape: 'sphere' },
  envelopeMass: { kind: 'fixed', massKg: 0.3 },
  payloadMassKg: 0.5,
  target: { kind: 'freeLift', freeLiftKg: 0.25 },
  gas: { gasId: 'helium' },
  ambient: { mode: 'standard', altitudeM: 0 },
}) as Record<string, unknown>;
const result = evaluate('envelope-sizing', inputs);

const version: VersionDetail = {
  number: 1,
  status: 'draft',
  note: '',
  author: { id: 'u1', displayName: 'Owner' },
  reviewer: null,
  engineVersion: '0.10.0',
  fingerprint: 'a'.repeat(64),
  createdAt: '2026-12-01T00:00:00Z',
  submittedAt: null,
  inputs,
  outputs: result.outputs,
  steps: result.steps,
  warnings: result.warnings,
  series: null,
};

// The request goes through the real API client; only the transport answers as the API would.
const realAdapter = apiClient.defaults.adapter;
const answerVersion: AxiosAdapter = async (config) => ({
  data: version,
  status: 200,
  statusText: 'OK',
  headers: {},
  config,
});
afterEach(() => {
  apiClient.defaults.adapter = realAdapter;
});

describe('the fill card page', () => {
  it('says the weight to hang as the filler mass is typed', async () => {
    apiClient.defaults.adapter = answerVersion;
    const user = userEvent.setup();
    renderInRouter(
      <FillCardPage
        calculationId={CALCULATION_ID}
        versionNumber={1}
        title="Harbour sphere"
        kind="envelope-sizing"
        kindTitle="Envelope sizing"
        unitSystem="si"
        renderQrCode={(url) => <p>QR of {url}</p>}
      />,
    );
    const filler = await screen.findByLabelText('Filler mass');
    await user.type(filler, '120 g');
    // check-values §6.1: neck lift = free lift + payload = 0.25 + 0.5 kg; less the 120 g filler.
    expect(screen.getByLabelText('Weight to hang on the filler')).toHaveTextContent('630.0 g');
    await user.clear(filler);
    await user.type(filler, '0.2 kg');
    expect(screen.getByLabelText('Weight to hang on the filler')).toHaveTextContent('550.0 g');
    expect(
      screen.getByText(/Fill until the balloon just lifts the filler and weight/),
    ).toBeInTheDocument();
    expect(
      screen.getByText(`QR of ${window.location.origin}/verify/${'a'.repeat(64)}`),
    ).toBeInTheDocument();
  });

  it('names the filler mass when it is more than the neck lift', async () => {
    apiClient.defaults.adapter = answerVersion;
    const user = userEvent.setup();
    renderInRouter(
      <FillCardPage
        calculationId={CALCULATION_ID}
        versionNumber={1}
        title="Harbour sphere"
        kind="envelope-sizing"
        kindTitle="Envelope sizing"
        unitSystem="si"
        renderQrCode={() => null}
      />,
    );
    await user.type(await screen.findByLabelText('Filler mass'), '2 kg');
    expect(await screen.findByText(/more than the neck lift/)).toBeInTheDocument();
    expect(screen.queryByLabelText('Weight to hang on the filler')).not.toBeInTheDocument();
  });
});
