import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { renderWithProviders } from '@/testing/test-utils';
import type { Envelope } from '../api/envelopes-api';
import { EnvelopeForm } from './envelope-form';
import { EnvelopePickerPanel } from './envelope-picker';

const envelope = (overrides: Partial<Envelope>): Envelope => ({
  id: '00000000-0000-4000-8000-00000000000a',
  name: 'Practice sphere 300 g',
  kind: 'extensible',
  massKg: 0.3,
  burstDiameterM: 4,
  ratedSuperpressurePa: null,
  dragCoefficient: 0.4,
  film: 'natural latex',
  notes: '',
  version: 1,
  fillCount: 0,
  permissions: { edit: true, remove: true },
  createdAt: '2026-12-04T07:00:00Z',
  updatedAt: '2026-12-04T07:00:00Z',
  ...overrides,
});

const LIBRARY = [
  envelope({}),
  envelope({
    id: '00000000-0000-4000-8000-00000000000b',
    name: 'Film cushion',
    kind: 'fixed',
    massKg: 0.15,
    burstDiameterM: null,
    ratedSuperpressurePa: 1500,
    dragCoefficient: null,
  }),
];

describe('the envelope form', () => {
  it('sends the figures in SI, only the measure of the chosen kind', async () => {
    const user = userEvent.setup();
    const onSubmit = vi.fn();
    renderWithProviders(
      <EnvelopeForm unitSystem="si" saving={false} error={null} onSubmit={onSubmit} />,
    );
    const add = screen.getByRole('button', { name: 'Add to the library' });
    expect(add).toBeDisabled();
    await user.type(screen.getByLabelText('Name'), 'Club sphere');
    await user.type(screen.getByLabelText('Mass'), '350 g');
    await user.type(screen.getByLabelText('Burst diameter'), '480 cm');
    // Switching to a fixed envelope asks for its rating instead, and drops the burst diameter.
    await user.click(screen.getByLabelText(/^Fixed volume/));
    expect(screen.queryByLabelText('Burst diameter')).not.toBeInTheDocument();
    await user.type(screen.getByLabelText('Rated superpressure'), '1.2 kPa');
    await waitFor(() => expect(add).toBeEnabled());
    await user.click(add);
    // 350 g = 0.35 kg and 1.2 kPa = 1200 Pa: SI prefixes (BIPM, The International System of
    // Units, 9th edition, Table 7).
    expect(onSubmit).toHaveBeenCalledWith({
      name: 'Club sphere',
      kind: 'fixed',
      massKg: expect.closeTo(0.35, 12),
      ratedSuperpressurePa: expect.closeTo(1200, 9),
      film: '',
      notes: '',
    });
  });

  it('refuses a mass outside the library’s range beside the field and holds saving back', async () => {
    const user = userEvent.setup();
    renderWithProviders(
      <EnvelopeForm
        envelope={LIBRARY[0]}
        unitSystem="si"
        saving={false}
        error={null}
        onSubmit={() => undefined}
      />,
    );
    const save = screen.getByRole('button', { name: 'Save changes' });
    await waitFor(() => expect(save).toBeEnabled());
    const mass = screen.getByLabelText('Mass');
    await user.clear(mass);
    await user.type(mass, '2000 kg');
    await waitFor(() => expect(save).toBeDisabled());
    expect(screen.getByRole('alert')).toHaveTextContent(/Mass: must be between 0 kg and 1000 kg/);
  });
});

/** The picker beside one field of a calculation's form, both on the same inputs. */
function Harness({ kindId, initial }: { kindId: string; initial: Record<string, unknown> }) {
  const [inputs, setInputs] = useState<Record<string, unknown>>(initial);
  const mass = (inputs.envelopeMass as { massKg?: number } | undefined)?.massKg;
  return (
    <>
      <EnvelopePickerPanel
        kindId={kindId}
        envelopes={LIBRARY}
        value={inputs}
        onChange={(next) => setInputs(next as Record<string, unknown>)}
      />
      <QuantityInput
        label="Envelope mass"
        dimension="mass"
        unitSystem="si"
        value={mass}
        onChange={(massKg) =>
          setInputs((current) => ({ ...current, envelopeMass: { kind: 'fixed', massKg } }))
        }
      />
      <output aria-label="Inputs">{JSON.stringify(inputs)}</output>
    </>
  );
}

describe('choosing from the envelope library in a calculation', () => {
  it('puts the envelope’s mass into a lift check’s form, where it can be changed', async () => {
    const user = userEvent.setup();
    renderWithProviders(
      <Harness
        kindId="lift-check"
        initial={{
          envelope: { shape: 'sphere', diameterM: 1.2 },
          envelopeMass: { kind: 'areal', arealDensityKgM2: 0.05 },
          payloadMassKg: 0.35,
        }}
      />,
    );
    await user.click(screen.getByRole('button', { name: 'Choose from the envelope library' }));
    await user.click(screen.getByRole('combobox', { name: 'Library envelope' }));
    await user.click(await screen.findByTitle('Practice sphere 300 g'));
    await user.click(screen.getByRole('button', { name: 'Use its figures' }));
    await waitFor(() => expect(screen.getByLabelText('Envelope mass')).toHaveValue('300 g'));
    expect(JSON.parse(screen.getByLabelText('Inputs').textContent ?? '{}')).toEqual({
      envelope: { shape: 'sphere', diameterM: 1.2 },
      envelopeMass: { kind: 'fixed', massKg: 0.3 },
      payloadMassKg: 0.35,
    });
    expect(screen.getByRole('alert')).toHaveTextContent(/Practice sphere 300 g/);

    // The person may still type over it.
    const mass = screen.getByLabelText('Envelope mass');
    await user.clear(mass);
    await user.type(mass, '320 g');
    await waitFor(() =>
      expect(JSON.parse(screen.getByLabelText('Inputs').textContent ?? '{}').envelopeMass).toEqual({
        kind: 'fixed',
        massKg: expect.closeTo(0.32, 12),
      }),
    );
  });

  it('offers a flight profile only the envelopes that stretch', async () => {
    const user = userEvent.setup();
    renderWithProviders(
      <Harness
        kindId="flight-profile"
        initial={{ envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 6 } }}
      />,
    );
    await user.click(screen.getByRole('button', { name: 'Choose from the envelope library' }));
    await user.click(screen.getByRole('combobox', { name: 'Library envelope' }));
    expect(await screen.findByTitle('Practice sphere 300 g')).toBeInTheDocument();
    expect(screen.queryByTitle('Film cushion')).not.toBeInTheDocument();
    await user.click(screen.getByTitle('Practice sphere 300 g'));
    await user.click(screen.getByRole('button', { name: 'Use its figures' }));
    expect(JSON.parse(screen.getByLabelText('Inputs').textContent ?? '{}')).toMatchObject({
      envelope: { kind: 'extensible', launchDiameterM: 1.6, burstDiameterM: 4 },
      envelopeMassKg: 0.3,
      dragCoefficient: 0.4,
    });
  });
});
