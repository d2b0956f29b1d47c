import { screen } from '@testing-library/react';
import { evaluate, KINDS, normaliseInputs } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { CalculationCharts } from './calculation-charts';

const example = (kind: string) =>
  normaliseInputs(kind, KINDS.find((candidate) => candidate.id === kind)?.example) as Record<
    string,
    unknown
  >;

const renderCharts = (kind: string, unitSystem: 'si' | 'us' = 'si') => {
  const inputs = example(kind);
  renderWithProviders(
    <CalculationCharts
      kind={kind}
      inputs={inputs}
      result={evaluate(kind, inputs)}
      unitSystem={unitSystem}
    />,
  );
};

describe('CalculationCharts', () => {
  it('shows a lift check against size, air temperature and purity, design point described', () => {
    renderCharts('lift-check');
    const charts = screen.getAllByRole('img').map((chart) => chart.getAttribute('aria-label'));
    expect(charts).toHaveLength(3);
    // The kind's example is a 1.2 m sphere in air at 288.15 K, pure helium.
    expect(charts[0]).toMatch(/^Lift against diameter: .*design point 1\.20 m,/);
    expect(charts[1]).toMatch(/^Lift against air temperature: .*design point 15\.0 °C,/);
    expect(charts[2]).toMatch(
      /^Lift against gas purity: net and free lift from 50 to 100 %; design point 100 %/,
    );
  });

  it('labels axes in the unit system chosen', () => {
    renderCharts('lift-check', 'us');
    const [size, temperature] = screen.getAllByRole('img');
    // 1.2 m = 3.937 ft; 288.15 K = 59 °F; 1 lb = 0.45359237 kg (NIST SP 811, appendix B).
    const freeKg = evaluate('lift-check', example('lift-check')).outputs.freeLift?.value ?? 0;
    expect(size?.getAttribute('aria-label')).toMatch(
      new RegExp(`design point 3\\.94 ft, free lift ${(freeKg / 0.45359237).toPrecision(3)} lb$`),
    );
    expect(temperature?.getAttribute('aria-label')).toMatch(/design point 59\.0 °F/);
  });

  it('marks the wanted free lift on a sizing chart', () => {
    renderCharts('envelope-sizing');
    const [chart] = screen.getAllByRole('img');
    expect(chart?.getAttribute('aria-label')).toMatch(/^Lift against size, around the size found/);
  });

  it('shows the cost of one fill by source for a gas supply', () => {
    renderCharts('gas-supply');
    expect(screen.getByRole('img').getAttribute('aria-label')).toMatch(
      /^Cost per fill by source: Electrolysis [\d.]+ EUR; Cylinders [\d.]+ EUR; Delivered gas [\d.]+ EUR$/,
    );
  });

  it('draws the flight profile with its burst marked', () => {
    renderCharts('flight-profile');
    expect(screen.getByRole('img').getAttribute('aria-label')).toMatch(/burst at [\d.]+ km/);
  });

  it('draws nothing for kinds without a picture', () => {
    renderCharts('ambient-air');
    expect(screen.queryByRole('img')).toBeNull();
  });
});
