import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { KINDS } from '@loftwright/buoyancy';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { useUnreadableFields } from '@/components/reading/unreadable-fields';
import { renderWithProviders } from '@/testing/test-utils';
import { CalculationInputsSection } from '../components/calculation-inputs-section';

const flight = KINDS.find((kind) => kind.id === 'flight-profile');

/** The editor's inputs column for a flight profile, its value shown as the form reports it. */
function FlightInputs() {
  const [value, setValue] = useState<unknown>(flight?.example);
  const [, registry] = useUnreadableFields();
  return (
    <>
      <CalculationInputsSection
        schema={flight?.inputSchema ?? {}}
        value={value}
        onChange={setValue}
        unitSystem="si"
        errors={{}}
        notes={{}}
        editable
        dirty={false}
        unreadableRegistry={registry}
      >
        {null}
      </CalculationInputsSection>
      <output aria-label="Reported inputs">{JSON.stringify(value)}</output>
    </>
  );
}

describe('winds from a file into the form', () => {
  it('puts the levels read into the wind, shown and kept in the form, nothing else changed', async () => {
    const user = userEvent.setup();
    renderWithProviders(<FlightInputs />);
    await user.click(screen.getByRole('button', { name: 'Winds from a file (CSV or text)' }));
    const dialog = await screen.findByRole('dialog');
    // Pasted in one go, as a person copies a forecast table.
    await user.click(within(dialog).getByLabelText('Wind text'));
    await user.paste('height,dir,speed\n0,270,4\n3000,250,18\n9000,260,35');
    await user.click(within(dialog).getByRole('button', { name: 'Use these 3 levels' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());

    const reported = JSON.parse(screen.getByLabelText('Reported inputs').textContent ?? '{}') as {
      wind?: { layers: unknown[] };
      payloadMassKg?: number;
    };
    expect(reported.wind?.layers).toEqual([
      { heightM: 0, directionDeg: 270, speedMS: 4 },
      { heightM: 3000, directionDeg: 250, speedMS: 18 },
      { heightM: 9000, directionDeg: 260, speedMS: 35 },
    ]);
    expect(reported.payloadMassKg).toBe(0.9);
    // The levels are fields of the form now, to be checked and edited before saving.
    expect(screen.getByRole('button', { name: 'Remove level 3' })).toBeInTheDocument();
  });
});
