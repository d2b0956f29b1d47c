import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import type { Dimension, UnitSystem } from '@loftwright/buoyancy';
import { renderWithProviders } from '@/testing/test-utils';
import { QuantityInput } from './quantity-input';

function Harness({
  dimension,
  initial,
  unitSystem = 'si',
}: {
  dimension: Dimension;
  initial?: number;
  unitSystem?: UnitSystem;
}) {
  const [value, setValue] = useState<number | undefined>(initial);
  return (
    <>
      <button type="button" onClick={() => setValue(2.5)}>
        Replace from outside
      </button>
      <QuantityInput
        label="Diameter"
        dimension={dimension}
        value={value}
        onChange={setValue}
        unitSystem={unitSystem}
      />
      <output aria-label="SI value">{value === undefined ? 'none' : String(value)}</output>
    </>
  );
}

describe('QuantityInput', () => {
  it('reads a number with a unit into SI and says what it understood', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Harness dimension="length" initial={1} />);
    const field = screen.getByLabelText('Diameter');
    await user.clear(field);
    await user.type(field, '163 cm');
    // 163 cm = 1.63 m (SI definition of the centimetre).
    expect(screen.getByLabelText('SI value')).toHaveTextContent('1.63');
    expect(screen.getByText('read as 163 cm (1.63 m)')).toBeInTheDocument();
  });

  it('reads degrees Fahrenheit and pounds, as US customary users type them', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Harness dimension="temperature" initial={288.15} unitSystem="us" />);
    const field = screen.getByLabelText('Diameter');
    expect(field).toHaveValue('59 °F');
    await user.clear(field);
    await user.type(field, '68 degF');
    // (68 − 32)·5/9 + 273.15 = 293.15 K (NIST SP 811, Appendix B).
    expect(Number(screen.getByLabelText('SI value').textContent)).toBeCloseTo(293.15, 9);
  });

  it('reads a bare number in the unit the field shows', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Harness dimension="mass" initial={0.18} />);
    const field = screen.getByLabelText('Diameter');
    expect(field).toHaveValue('180 g');
    await user.clear(field);
    await user.type(field, '250');
    expect(Number(screen.getByLabelText('SI value').textContent)).toBeCloseTo(0.25, 12);
  });

  it('explains text of the wrong dimension and reports no value', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Harness dimension="length" initial={1} />);
    const field = screen.getByLabelText('Diameter');
    await user.clear(field);
    await user.type(field, '5 kg');
    expect(screen.getByText(/is not a length/)).toBeInTheDocument();
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByLabelText('SI value')).toHaveTextContent('none');
  });

  it('shows a value set from outside (another version taken) instead of the old text', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Harness dimension="length" initial={1} />);
    const field = screen.getByLabelText('Diameter');
    await user.clear(field);
    await user.type(field, '150 cm');
    expect(field).toHaveValue('150 cm');
    await user.click(screen.getByRole('button', { name: 'Replace from outside' }));
    expect(field).toHaveValue('2.5 m');
    expect(screen.getByText('read as 2.5 m')).toBeInTheDocument();
    // Typing again is read as before, and is not overwritten.
    await user.clear(field);
    await user.type(field, '90 cm');
    expect(field).toHaveValue('90 cm');
    expect(screen.getByLabelText('SI value')).toHaveTextContent('0.9');
  });
});
