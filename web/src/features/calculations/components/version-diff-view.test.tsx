import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { VersionDiffView } from './version-diff-view';

describe('VersionDiffView', () => {
  it('shows each changed input by its label with units, and each result in one unit per row', () => {
    renderWithProviders(
      <VersionDiffView
        kind="lift-check"
        unitSystem="si"
        diff={{
          from: 1,
          to: 2,
          inputs: [
            { path: 'payloadMassKg', from: 0.2, to: 0.35 },
            { path: 'gas.gasId', from: 'helium', to: 'hydrogen' },
          ],
          outputs: [
            { name: 'freeLift', label: 'Free lift', unit: 'kg', from: 0.42, to: 0.27 },
            // 7,668 s and 6,522 s: both in hours, never hours against minutes.
            { name: 'time', label: 'Time to burst', unit: 's', from: 7668, to: 6522 },
          ],
          engineVersion: { from: '0.1.0', to: '0.1.0' },
        }}
      />,
    );
    const inputs = screen.getByRole('table', { name: 'Changed inputs' });
    expect(within(inputs).getByText('Payload hanging below the envelope')).toBeInTheDocument();
    expect(within(inputs).queryByText(/payloadMassKg|gasId/)).toBeNull();
    expect(within(inputs).getByText('350 g')).toBeInTheDocument();
    expect(within(inputs).getByText('Helium')).toBeInTheDocument();
    expect(within(inputs).getByText('Hydrogen')).toBeInTheDocument();
    const results = screen.getByRole('table', { name: 'Changed results' });
    expect(within(results).getByText('Free lift')).toBeInTheDocument();
    // Small masses show in grams: 0.42 kg -> 420.0 g.
    expect(within(results).getByText('420.0 g')).toBeInTheDocument();
    expect(within(results).getByText('270.0 g')).toBeInTheDocument();
    expect(within(results).getByText('2.130 h')).toBeInTheDocument();
    expect(within(results).getByText('1.812 h')).toBeInTheDocument();
  });

  it('says so when two versions are the same', () => {
    renderWithProviders(
      <VersionDiffView
        kind="lift-check"
        unitSystem="si"
        diff={{
          from: 1,
          to: 3,
          inputs: [],
          outputs: [],
          engineVersion: { from: '0.1.0', to: '0.1.0' },
        }}
      />,
    );
    expect(
      screen.getByText('Versions 1 and 3 have the same inputs and results.'),
    ).toBeInTheDocument();
  });
});
