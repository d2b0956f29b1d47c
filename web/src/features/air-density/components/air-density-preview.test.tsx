import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { AirDensityPreview } from './air-density-preview';

describe('AirDensityPreview', () => {
  it('shows the standard sea-level density for 15 °C and 1013.25 hPa', () => {
    renderWithProviders(<AirDensityPreview />);
    // U.S. Standard Atmosphere 1976, Table I: 1.2250 kg/m3 at 288.15 K, 101 325 Pa.
    expect(screen.getByRole('status')).toHaveTextContent('1.2250 kg/m³');
  });

  it('recomputes as the user types and explains an out-of-range temperature', async () => {
    const user = userEvent.setup();
    renderWithProviders(<AirDensityPreview />);
    const temperature = screen.getByLabelText('Air temperature');

    await user.clear(temperature);
    await user.type(temperature, '-150');
    // The engine's air range, 173.15–423.15 K, said in °C beside the field.
    expect(
      screen.getByText('Air temperature must be between \u2212100 °C and 150 °C'),
    ).toBeInTheDocument();
    expect(screen.getByRole('status')).toHaveTextContent('The density waits for: air temperature.');

    await user.clear(temperature);
    // A bare number is in the unit the field shows, °C.
    await user.type(temperature, '30');
    // Ideal-gas law with the 1976 constants: 101 325 Pa × 0.0289644 / (8.31432 × 303.15).
    expect(screen.getByRole('status')).toHaveTextContent('1.1644 kg/m³');
  });
});
