import { fireEvent, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { FillLogForm, type FillLogVersion } from './fill-log-form';

const liftCheckInputs = {
  envelope: { shape: 'sphere', diameterM: 1 },
  envelopeMass: { kind: 'fixed', massKg: 0.1 },
  payloadMassKg: 0.2,
  gas: { gasId: 'helium' },
  ambient: {
    mode: 'measured',
    temperatureK: 298.15,
    pressurePa: 95000,
    humidity: { kind: 'relative', relativeHumidity: 0.6 },
  },
};

const form = (version: FillLogVersion) => (
  <FillLogForm
    calculationId="00000000-0000-4000-8000-000000000001"
    versionNumber={3}
    version={version}
    unitSystem="si"
    open
    onClose={() => undefined}
    onCreated={() => undefined}
  />
);

const renderForm = (version: FillLogVersion) => renderWithProviders(form(version));

/** The version read from the server only after the dialog opened. */
function LateVersion() {
  const [version, setVersion] = useState<FillLogVersion>({ status: 'pending' });
  return (
    <>
      <button
        type="button"
        onClick={() => setVersion({ status: 'success', inputs: liftCheckInputs })}
      >
        The version arrives
      </button>
      {form(version)}
    </>
  );
}

const hintOf = (field: HTMLElement) =>
  document.getElementById(field.getAttribute('aria-describedby') ?? '')?.textContent;

describe('the fill-log form', () => {
  it('starts from the air the version was computed for', async () => {
    renderForm({ status: 'success', inputs: liftCheckInputs });
    // 298.15 K is 25 °C and 95 000 Pa is 950 hPa (NIST SP 811, Appendix B).
    expect(await screen.findByLabelText('Air temperature')).toHaveValue('25 °C');
    expect(screen.getByLabelText('Air pressure (absolute)')).toHaveValue('950 hPa');
    expect(screen.getByLabelText('Relative humidity')).toHaveValue('60 %');
    expect(
      screen.getByText('Starting from the air version 3 was computed for: measured air.'),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save fill log' })).toBeDisabled();
  });

  it('refuses 150 % relative humidity beside the field and holds saving back', async () => {
    const user = userEvent.setup();
    renderForm({ status: 'success', inputs: liftCheckInputs });
    await user.type(screen.getByLabelText('Reading 1 ballast mass'), '3 kg');
    await user.type(screen.getByLabelText('Reading 1 scale reading'), '1.05 kg');
    const save = screen.getByRole('button', { name: 'Save fill log' });
    // The form checks as the person types and may render the verdict a moment later: wait for it.
    await waitFor(() => expect(save).toBeEnabled());

    const humidity = screen.getByLabelText('Relative humidity');
    await user.clear(humidity);
    await user.type(humidity, '150');
    await waitFor(() =>
      expect(hintOf(humidity)).toBe('Relative humidity must be between 0 % and 100 %'),
    );
    expect(humidity).toHaveAttribute('aria-invalid', 'true');
    await waitFor(() => expect(save).toBeDisabled());
    expect(screen.getByRole('alert')).toHaveTextContent(
      'Not saved until these are put right: Relative humidity: must be between 0 % and 100 %',
    );

    await user.clear(humidity);
    await user.type(humidity, '95');
    await waitFor(() =>
      expect(hintOf(humidity)).toBe('read as 95 % (a number alone is a percentage)'),
    );
    await waitFor(() => expect(save).toBeEnabled());
  });

  it('starts the instruments at the engine’s stated defaults and refuses a negative resolution', async () => {
    renderForm({ status: 'success', inputs: liftCheckInputs });
    const resolution = await screen.findByLabelText('Scale resolution');
    const tolerance = screen.getByLabelText('Ballast tolerance (±)');
    expect(resolution).toHaveValue('1 g');
    expect(tolerance).toHaveValue('0.5 g');
    await userEvent.clear(resolution);
    await userEvent.type(resolution, '-2 g');
    fireEvent.blur(resolution);
    expect(screen.getByRole('button', { name: 'Save fill log' })).toBeDisabled();
    expect(screen.getByRole('alert')).toHaveTextContent(
      /Scale resolution: must be between 0 kg and 10 kg/,
    );
  });

  it('holds saving back while a field does not read, and names it', async () => {
    const user = userEvent.setup();
    renderForm({ status: 'success', inputs: liftCheckInputs });
    await user.type(screen.getByLabelText('Reading 1 ballast mass'), '3 kg');
    await user.type(screen.getByLabelText('Reading 1 scale reading'), '1.05 kg');
    const pressure = screen.getByLabelText('Air pressure (absolute)');
    await user.clear(pressure);
    await user.type(pressure, '950 kg');
    expect(screen.getByRole('button', { name: 'Save fill log' })).toBeDisabled();
    expect(screen.getByRole('alert')).toHaveTextContent(/Air pressure \(absolute\): “950 kg”/);
  });

  it('waits for a version still on its way, then starts from its air', async () => {
    renderWithProviders(<LateVersion />);
    // A skeleton, no fields to type in and nothing to save yet.
    expect(screen.queryByLabelText('Air temperature')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Save fill log' })).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'The version arrives', hidden: true }));
    expect(await screen.findByLabelText('Air temperature')).toHaveValue('25 °C');
    expect(screen.getByLabelText('Air pressure (absolute)')).toHaveValue('950 hPa');
  });

  it('says so when the version names no air, and starts from sea level', async () => {
    renderForm({ status: 'success', inputs: { envelope: { shape: 'sphere', diameterM: 1 } } });
    expect(
      await screen.findByText('This version names no air; starting from 15 °C, 1013.25 hPa'),
    ).toBeInTheDocument();
    // U.S. Standard Atmosphere 1976, Table I, sea level: 288.15 K = 15 °C, 101 325 Pa.
    expect(screen.getByLabelText('Air temperature')).toHaveValue('15 °C');
    expect(screen.getByLabelText('Air pressure (absolute)')).toHaveValue('1013.25 hPa');
    expect(screen.getByLabelText('Relative humidity')).toHaveValue('');
  });
});
