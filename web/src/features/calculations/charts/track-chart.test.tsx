import { screen, waitFor, within } from '@testing-library/react';
import { type DataSeries, evaluate, KINDS, landingArea } from '@loftwright/buoyancy';
import type { AxiosAdapter } from 'axios';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithProviders } from '@/testing/test-utils';
import type { ClientConfig } from '../api/get-client-config';
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

/**
 * A flight 30 km due east from 53.2° N 9° W. That point lies in tile 486/332 at zoom 10, whose
 * bounds are 9.140625° W to 8.7890625° W and 53.12040528310657° N to 53.33087298301705° N
 * (mercantile's README, github.com/sgillies/mercantile, `bounds(486, 332, 10)`).
 */
const FROM_A_SITE: DataSeries = {
  label: 'Ground track',
  columns: [
    ...EASTWARD.columns,
    { key: 'latitude', label: 'Latitude', unit: '°' },
    { key: 'longitude', label: 'Longitude', unit: '°' },
  ],
  rows: [
    [0, 0, 0, 100, 53.2, -9],
    [3600, 15000, 0, 20000, 53.2, -8.775],
    [5400, 30000, 0, 100, 53.2, -8.55],
  ],
};

const TILES = { urlTemplate: 'https://tiles.test/{z}/{x}/{y}.png', attribution: '© Test tiles' };

// Requests go through the real API client; only the transport answers, as the API would. No
// tile is loaded: jsdom does not fetch an SVG image's href.
const realAdapter = apiClient.defaults.adapter;
const requested: string[] = [];
const answering =
  (config: ClientConfig): AxiosAdapter =>
  async (request) => {
    requested.push(request.url ?? '');
    return { data: config, status: 200, statusText: 'OK', headers: {}, config: request };
  };
beforeEach(() => {
  requested.length = 0;
  apiClient.defaults.adapter = answering({ mapTiles: null });
});
afterEach(() => {
  apiClient.defaults.adapter = realAdapter;
});

const tileImages = (container: HTMLElement) =>
  [...container.querySelectorAll('[data-chart="drift-track"] image')].map((image) =>
    image.getAttribute('href'),
  );

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

describe('TrackChart base map', () => {
  it('draws the configured tiles under the track, faded, with the credit under the chart', async () => {
    apiClient.defaults.adapter = answering({ mapTiles: TILES });
    const { container } = renderWithProviders(
      <TrackChart series={FROM_A_SITE} outputs={{}} unitSystem="si" />,
    );
    expect(await screen.findByText('Map: © Test tiles')).toBeInTheDocument();
    const hrefs = tileImages(container);
    // The launch's tile (mercantile's bounds above): a 33 km square at 53° N takes zoom 10.
    expect(hrefs).toContain('https://tiles.test/10/486/332.png');
    expect(hrefs.length).toBeGreaterThanOrEqual(2);
    expect(hrefs.length).toBeLessThanOrEqual(16);
    for (const href of hrefs) expect(href).toMatch(/^https:\/\/tiles\.test\/10\/\d+\/\d+\.png$/);
    expect(requested).toEqual(['/client-config']);
    // The launch marker sits inside its tile's box.
    const launchTile = container.querySelector('image[href$="/10/486/332.png"]');
    const launch = screen.getByRole('img', { name: 'Launch' }).querySelector('circle');
    const [x, y, width, height, cx, cy] = [
      launchTile?.getAttribute('x'),
      launchTile?.getAttribute('y'),
      launchTile?.getAttribute('width'),
      launchTile?.getAttribute('height'),
      launch?.getAttribute('cx'),
      launch?.getAttribute('cy'),
    ].map(Number);
    expect(cx).toBeGreaterThanOrEqual(x as number);
    expect(cx).toBeLessThanOrEqual((x as number) + (width as number));
    expect(cy).toBeGreaterThanOrEqual(y as number);
    expect(cy).toBeLessThanOrEqual((y as number) + (height as number));
    // Under everything else: the tiles come first in the drawing, in a faded group.
    const layer = container.querySelector('[data-layer="base-map"]');
    const rings = screen.getByRole('list', { name: 'Range rings round the launch' });
    expect(
      layer && layer.compareDocumentPosition(rings) & Node.DOCUMENT_POSITION_FOLLOWING,
    ).toBeTruthy();
    expect(Number(layer?.querySelector('[opacity]')?.getAttribute('opacity'))).toBeLessThan(1);
  });

  it('draws no tiles and no credit when the deployment configured none', async () => {
    const { container } = renderWithProviders(
      <TrackChart series={FROM_A_SITE} outputs={{}} unitSystem="si" />,
    );
    await waitFor(() =>
      expect(container.querySelector('[data-chart="drift-track"]')).toHaveAttribute(
        'data-base-map',
        'none',
      ),
    );
    expect(requested).toEqual(['/client-config']);
    expect(tileImages(container)).toEqual([]);
    expect(screen.queryByText(/^Map:/)).toBeNull();
  });

  it('neither asks for tiles nor draws any for a flight without a launch site', () => {
    apiClient.defaults.adapter = answering({ mapTiles: TILES });
    const { container } = renderWithProviders(
      <TrackChart series={EASTWARD} outputs={{}} unitSystem="si" />,
    );
    expect(container.querySelector('[data-chart="drift-track"]')).toHaveAttribute(
      'data-base-map',
      'none',
    );
    expect(tileImages(container)).toEqual([]);
    expect(requested).toEqual([]);
  });
});
