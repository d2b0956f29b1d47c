import { render, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { PanelBoundary } from './panel-boundary';

function Broken(): never {
  throw new Error('the chart data is malformed');
}

describe('PanelBoundary', () => {
  it('shows a failing panel’s error in its place and leaves the rest of the page', () => {
    const quiet = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    render(
      <>
        <p>Inputs stay here</p>
        <PanelBoundary what="the charts">
          <Broken />
        </PanelBoundary>
      </>,
    );
    expect(screen.getByText('Inputs stay here')).toBeInTheDocument();
    expect(screen.getByText('Could not show the charts.')).toBeInTheDocument();
    expect(screen.getByText('the chart data is malformed')).toBeInTheDocument();
    quiet.mockRestore();
  });
});
