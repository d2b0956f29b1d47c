import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { WindLayerValues } from '@loftwright/buoyancy';
import { describe, expect, it, vi } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { WindImport } from './wind-import';

// A forecast export in knots and °C with one unreadable direction on line 4.
const SAMPLE = [
  'height_m,direction_deg,speed_kn,temperature_c',
  '0,270,10,15',
  '1000,280,20,8.5',
  '2000,x,25,2',
  '3000,300,40,-4.5',
].join('\n');

// NIST Special Publication 811 (2008), appendix B.8: 1 knot = 1852/3600 m/s exactly;
// B.9: t/K = t/°C + 273.15.
const KNOT_MS = 1852 / 3600;

/** Picks an option of a select opened for the first time (its list is the newest one). */
async function chooseOption(label: string, option: string) {
  const user = userEvent.setup({ pointerEventsCheck: 0 });
  const before = document.querySelectorAll('.ant-select-dropdown').length;
  await user.click(screen.getByRole('combobox', { name: label }));
  // Other selects show their chosen value with the same title, and antd gives every list the
  // same id under test: take the list this click added.
  const popup = await waitFor(() => {
    const lists = document.querySelectorAll('.ant-select-dropdown');
    const added = lists.length > before ? lists[lists.length - 1] : undefined;
    if (!(added instanceof HTMLElement)) throw new Error(`no list for ${label}`);
    return added;
  });
  await user.click(within(popup).getByTitle(option));
}

describe('WindImport', () => {
  it('previews the levels, lists the bad line by number and hands over SI levels', async () => {
    const user = userEvent.setup();
    const onUse = vi.fn<(layers: WindLayerValues[]) => void>();
    renderWithProviders(<WindImport open unitSystem="si" onClose={() => {}} onUse={onUse} />);
    await user.upload(
      screen.getByLabelText('Wind file'),
      new File([SAMPLE], 'winds.csv', { type: 'text/csv' }),
    );
    await waitFor(() => expect(screen.getByLabelText('Wind text')).toHaveValue(SAMPLE));
    await chooseOption('Speed unit', 'kn');
    await chooseOption('Temperature column', '4: temperature_c');

    const bad = await screen.findByLabelText('Lines left out');
    expect(within(bad).getByText(/^Line 4: direction \(column 2\) “x”/)).toBeInTheDocument();
    const levels = screen.getByRole('table', { name: 'Levels read from the file' });
    // Header row plus the three good lines (2, 3 and 5).
    expect(within(levels).getAllByRole('row')).toHaveLength(4);
    expect(levels).toHaveTextContent((10 * KNOT_MS).toFixed(2));
    expect(
      screen.getByText(/replace the standard atmosphere up to its top level/),
    ).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Use these 3 levels' }));
    const layers = onUse.mock.calls[0]?.[0] ?? [];
    expect(layers.map((layer) => layer.heightM)).toEqual([0, 1000, 3000]);
    expect(layers[2]?.speedMS).toBeCloseTo(40 * KNOT_MS, 9);
    expect(layers[2]?.temperatureK).toBeCloseTo(-4.5 + 273.15, 9);
    expect(layers[1]?.directionDeg).toBe(280);
  });

  it('reads pasted whitespace text by pressure and names a mapping it cannot use', async () => {
    const user = userEvent.setup();
    const onUse = vi.fn<(layers: WindLayerValues[]) => void>();
    renderWithProviders(<WindImport open unitSystem="si" onClose={() => {}} onUse={onUse} />);
    await chooseOption('Height column', 'not in the file');
    await user.click(screen.getByRole('checkbox'));
    await user.click(screen.getByLabelText('Wind text'));
    await user.paste('1000 270 5\n850 250 12');
    // Neither height nor pressure mapped: the reader says which field to set.
    await waitFor(() =>
      expect(screen.getByText(/^Height column give a height column/)).toBeInTheDocument(),
    );
    await chooseOption('Pressure column', 'column 1');
    await user.click(screen.getByRole('button', { name: 'Use these 2 levels' }));
    const layers = onUse.mock.calls[0]?.[0] ?? [];
    // 1000 hPa = 100000 Pa (1 hPa = 100 Pa, NIST SP 811 appendix B.8).
    expect(layers.map((layer) => layer.pressurePa)).toEqual([100000, 85000]);
  });
});
