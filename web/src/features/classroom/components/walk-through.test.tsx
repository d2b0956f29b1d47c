import { evaluate } from '@loftwright/buoyancy';
import { fireEvent, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import type { ExampleStep } from '../api/classroom-api';
import { TryItYourself } from './try-it-yourself';
import { WalkThrough } from './walk-through';

const inputs = { gas: { gasId: 'helium' }, ambient: { mode: 'standard', altitudeM: 0 } };
const result = evaluate('lifting-gas', inputs);
const steps: ExampleStep[] = result.steps.map((step) => ({ ...step, hidden: false }));

describe('WalkThrough', () => {
  it('moves through formula, numbers and result with the keyboard and marks the current step', () => {
    renderWithProviders(
      <WalkThrough
        title="Lift"
        steps={steps}
        notes={{ [steps[0]?.id ?? '']: 'Start here.' }}
        chartStepId={null}
      />,
    );
    const region = screen.getByRole('region', { name: 'Walk-through: Lift' });
    region.focus();
    const current = () => region.querySelector('[aria-current="step"]') as HTMLElement;
    expect(current().querySelector('[data-part="formula"]')).not.toBeNull();
    expect(current().querySelector('[data-part="values"]')).toBeNull();
    expect(current().textContent).toContain('Start here.');
    fireEvent.keyDown(region, { key: 'ArrowRight' });
    expect(current().querySelector('[data-part="values"]')).not.toBeNull();
    fireEvent.keyDown(region, { key: ' ' });
    expect(current().querySelector('[data-part="result"]')).not.toBeNull();
    fireEvent.keyDown(region, { key: 'PageDown' });
    expect(screen.getByText(new RegExp(`^Step 2 of ${steps.length}`))).toBeInTheDocument();
    fireEvent.keyDown(region, { key: 'a' });
    expect(region.querySelectorAll('li[data-step]')).toHaveLength(steps.length);
    expect(current().dataset.step).toBe(steps.at(-1)?.id);
    fireEvent.keyDown(region, { key: 'Home' });
    expect(region.querySelectorAll('li[data-step]')).toHaveLength(1);
  });

  it('shows the chart only once the walk-through reaches its step', () => {
    renderWithProviders(
      <WalkThrough
        title="Lift"
        steps={steps}
        notes={{}}
        chart={<p>the chart</p>}
        chartStepId={steps[1]?.id ?? null}
      />,
    );
    const region = screen.getByRole('region', { name: 'Walk-through: Lift' });
    for (let i = 0; i < 4; i += 1) fireEvent.keyDown(region, { key: 'ArrowRight' });
    expect(screen.queryByText('the chart')).toBeNull();
    fireEvent.keyDown(region, { key: 'ArrowRight' });
    expect(screen.getByText('the chart')).toBeInTheDocument();
  });

  it('keeps a hidden result as a question mark', () => {
    const hidden = steps.map((step) =>
      step.id === 'lift-per-cubic-metre'
        ? { ...step, hidden: true, result: { ...step.result, value: null } }
        : step,
    );
    renderWithProviders(<WalkThrough title="Lift" steps={hidden} notes={{}} chartStepId={null} />);
    fireEvent.keyDown(screen.getByRole('region', { name: 'Walk-through: Lift' }), { key: 'End' });
    const last = document.querySelector(
      'li[data-step="lift-per-cubic-metre"] [data-part="result"]',
    );
    expect(last?.textContent).toContain('= ?');
    expect(last?.textContent).not.toMatch(/1\.05/);
  });
});

describe('TryItYourself', () => {
  it('recomputes with the student’s input and refuses a value outside the range, without clamping', async () => {
    const user = userEvent.setup();
    renderWithProviders(
      <TryItYourself
        kind="lifting-gas"
        inputs={inputs}
        outputs={result.outputs}
        ranges={{ 'ambient.altitudeM': { min: 0, max: 5000 } }}
        unitSystem="si"
      />,
    );
    const field = screen.getByRole('textbox', { name: /altitude/i });
    await user.clear(field);
    await user.type(field, '2000 m');
    // U.S. Standard Atmosphere 1976 (PDAS table): σ = 0.821 68 at 2 km, so air 1.0066 kg/m³
    // and, less the helium at that height, about 0.87 kg of lift per cubic metre.
    const yours = document.querySelector('[data-yours="airDensity"]');
    expect(Number.parseFloat(yours?.textContent ?? '')).toBeCloseTo(1.225 * 0.82168, 3);
    await user.clear(field);
    await user.type(field, '6000 m');
    expect(screen.getByRole('alert').textContent).toMatch(/Outside what your teacher allowed/);
    expect(document.querySelector('[data-yours="airDensity"]')).toBeNull();
  });
});
