import { screen, within } from '@testing-library/react';
import { type DataSeries, evaluate, KINDS, landingArea } from '@loftwright/buoyancy';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { TrackChart } from './track-chart';
import { METRES_PER_MILE, roundStep, trackPlot } from './track-plot';

/** A straight flight due east to 16 093.44 m (10 international miles) at 20 km altitude. */
const EASTWARD: DataSeries = {
  label: 'Ground track',
  columns: [
    { key: 'time', label: 'Time since launch', unit: 's' },
    { key: 'east', label: 'East of launch', unit: 'm' },
    { key: 'north', label: 'North of launch', unit: 'm' },
    { key: 'altitude', label: 'Altitude', unit: 'm' },
  ],
  rows: [
    [0, 0, 0, 100],
    [3600, 8000, 0, 20000],
    [5400, 16093.44, 0, 100],
  ],
};

/** The kind's own example flown in a steady 10 m/s westerly from a site at 52° N. */
function windyFlight() {
  const example = KINDS.find((kind) => kind.id === 'flight-profile')?.example as Record<
    string,
    unknown
  >;
  const launch = example.launch as Record<string, unknown>;
  return {
    ...example,
    launch: { ...launch, latitudeDeg: 52, longitudeDeg: 0 },
    wind: {
      layers: [
        { heightM: 0, directionDeg: 270, speedMS: 10 },
        { heightM: 40000, directionDeg: 270, speedMS: 10 },
      ],
    },
    landingArea: { runs: 20, seed: 7 },
  };
}

describe('trackPlot', () => {
  it('gives both axes the same span, so distances read true', () => {
    const plot = trackPlot(EASTWARD, 'si');
    const span = ([low, high]: readonly [number, number]) => high - low;
    expect(plot && span(plot.domainX)).toBeCloseTo(plot ? span(plot.domainY) : Number.NaN, 12);
  });

  it('rounds ring steps to 1, 2 or 5 times a power of ten', () => {
    expect([0.3, 1.4, 2.96, 7, 42].map(roundStep)).toEqual([0.5, 2, 5, 10, 50]);
  });
});

describe('TrackChart', () => {
  it('marks launch, burst and landing and rings in km', () => {
    renderWithProviders(<TrackChart series={EASTWARD} outputs={{}} unitSystem="si" />);
    // 16 093.44 m = 16.1 km due east (bearing 90°).
    expect(
      screen.getByRole('img', { name: 'Landing: 16.1 km from launch, bearing 90°' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /^Burst: 8\.00 km from launch/ })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Launch' })).toBeInTheDocument();
    const rings = within(screen.getByRole('list', { name: 'Range rings round the launch' }));
    expect(rings.getAllByRole('listitem').map((ring) => ring.getAttribute('aria-label'))).toEqual([
      'Range ring 5.00 km',
      'Range ring 10.0 km',
      'Range ring 15.0 km',
    ]);
  });

  it('draws miles in the US system', () => {
    renderWithProviders(<TrackChart series={EASTWARD} outputs={{}} unitSystem="us" />);
    // NIST SP 811 appendix B.8: 1 mi = 1609.344 m, so 16 093.44 m is 10 mi exactly.
    expect(16093.44 / METRES_PER_MILE).toBe(10);
    expect(
      screen.getByRole('img', { name: 'Landing: 10.0 mi from launch, bearing 90°' }),
    ).toBeInTheDocument();
    expect(screen.getByRole('listitem', { name: 'Range ring 10.0 mi' })).toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Drift track in words' })).toHaveTextContent(
      'Landing10.0 mi from launch, bearing 90°',
    );
  });

  it('draws the 50 % and 95 % landing regions of an estimated landing area', () => {
    const inputs = windyFlight();
    const result = evaluate('flight-profile', inputs);
    const track = result.series?.track;
    if (!track) throw new Error('the windy flight has no track');
    const area = landingArea(inputs as Parameters<typeof landingArea>[0]);
    renderWithProviders(
      <TrackChart series={track} outputs={result.outputs} unitSystem="si" landingArea={area} />,
    );
    expect(screen.getByRole('img', { name: '50 % landing area' })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: '95 % landing area' })).toBeInTheDocument();
    // A westerly (wind from 270°) carries the balloon east: the landing bearing is 90° ± a few.
    expect(
      screen.getByRole('img', {
        name: /^Landing: [\d.]+ km from launch, bearing (8[5-9]|9[0-5])°$/,
      }),
    ).toBeInTheDocument();
  });
});
