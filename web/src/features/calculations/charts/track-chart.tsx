import { Card, Descriptions, Flex, theme } from 'antd';
import type { CalculationResult, DataSeries, LandingArea, UnitSystem } from '@loftwright/buoyancy';
import { CartesianGrid, Scatter, ScatterChart, XAxis, YAxis } from 'recharts';
import { usePlainNumbers } from '@/components/reading/use-number-display';
import { useMapTiles } from '../api/get-client-config';
import { TrackBaseMap } from './track-base-map';
import { type MarkerNames, TrackLayers } from './track-layers';
import { bearingDeg, type Point, trackLaunchSite, trackPlot } from './track-plot';
import { baseMapTiles } from './track-tiles';

/** The chart's side in pixels: a square, so that east and north share one scale. */
const SIDE_PX = 340;
/** Room for each axis and its label; the same on both, so the plot area is square too. */
const AXIS_PX = 48;

/**
 * The drift track seen from above: east and north of launch in km (mi in the US system) on equal
 * scales, range rings round the launch, launch, burst and landing marked, and the landing area's
 * 50 % and 95 % regions with its runs when one has been estimated. A base map is drawn beneath
 * only when the deployment configured a tile server (MAP_TILE_URL) and the flight has a launch
 * site; otherwise no tile is fetched from anywhere.
 */
export function TrackChart({
  series,
  outputs,
  unitSystem,
  landingArea,
}: {
  series: DataSeries;
  outputs: CalculationResult['outputs'];
  unitSystem: UnitSystem;
  landingArea?: LandingArea;
}) {
  const { token } = theme.useToken();
  const display = usePlainNumbers();
  const site = trackLaunchSite(series);
  // Without a launch site there is nothing to place tiles by, so the server is not even asked.
  const mapTiles = useMapTiles(site !== undefined);
  const plot = trackPlot(series, unitSystem, landingArea);
  if (!plot) return null;
  const tiles =
    site && mapTiles ? baseMapTiles({ site, urlTemplate: mapTiles.urlTemplate, ...plot }) : [];
  const distance = (point: Point) =>
    `${display.number(Math.hypot(point[0], point[1]), { significantDigits: 3 })} ${plot.unit}`;
  const where = (point: Point) =>
    `${distance(point)} from launch, bearing ${display.fixed(bearingDeg(point), 0)}°`;
  // The landing's distance and bearing are the engine's (geodesic when the site is given), so
  // they match the results panel; the burst's are read off the drawing.
  const { groundDistance, initialBearing, flightTime } = outputs;
  const landingWhere =
    groundDistance && initialBearing
      ? `${display.number(groundDistance.value / plot.metresPerUnit, { significantDigits: 3 })} ${plot.unit} from launch, bearing ${display.fixed(initialBearing.value, 0)}°`
      : where(plot.landing);
  const names: MarkerNames = {
    launch: 'Launch',
    burst: `Burst: ${where(plot.burst)}`,
    landing: `Landing: ${landingWhere}`,
  };
  const flightTimeS = flightTime?.value ?? trackDurationS(series);
  return (
    <Card
      title="Drift track, seen from above"
      size="small"
      style={{ marginTop: 16 }}
      data-chart="drift-track"
      data-base-map={mapTiles === undefined ? 'pending' : tiles.length > 0 ? 'configured' : 'none'}
    >
      <Flex wrap gap={16} align="start">
        <figure style={{ margin: 0, width: SIDE_PX }}>
          <ScatterChart
            width={SIDE_PX}
            height={SIDE_PX}
            margin={{ top: 8, right: 8, bottom: 8, left: 8 }}
            role="group"
            aria-label={`Drift track in ${plot.unit}, east and north of launch`}
          >
            <TrackBaseMap tiles={tiles} />
            <CartesianGrid stroke={token.colorBorderSecondary} />
            <XAxis
              type="number"
              dataKey="east"
              domain={[...plot.domainX]}
              ticks={[...plot.ticksX]}
              allowDataOverflow
              height={AXIS_PX}
              tickFormatter={(value: number) => display.number(value, { significantDigits: 3 })}
              label={{ value: `East (${plot.unit})`, position: 'insideBottom', offset: 4 }}
            />
            <YAxis
              type="number"
              dataKey="north"
              domain={[...plot.domainY]}
              ticks={[...plot.ticksY]}
              allowDataOverflow
              width={AXIS_PX}
              tickFormatter={(value: number) => display.number(value, { significantDigits: 3 })}
              label={{ value: `North (${plot.unit})`, angle: -90, position: 'insideLeft' }}
            />
            {/* The axes need data to lay out; the track itself is drawn by TrackLayers. */}
            <Scatter
              data={plot.track.map(([east, north]) => ({ east, north }))}
              shape={() => <g />}
              isAnimationActive={false}
            />
            <TrackLayers
              plot={plot}
              names={names}
              formatRing={(radius) =>
                `${display.number(radius, { significantDigits: 3 })} ${plot.unit}`
              }
            />
          </ScatterChart>
          {tiles.length > 0 && mapTiles ? (
            // Tile providers require their credit beside the map.
            <figcaption style={{ color: token.colorTextSecondary, fontSize: token.fontSizeSM }}>
              Map: {mapTiles.attribution}
            </figcaption>
          ) : null}
        </figure>
        <section aria-label="Drift track in words" style={{ flex: '1 1 180px' }}>
          <Descriptions
            size="small"
            column={1}
            items={[
              { key: 'landing', label: 'Landing', children: landingWhere },
              { key: 'burst', label: 'Burst', children: where(plot.burst) },
              ...(flightTimeS !== undefined
                ? [
                    {
                      key: 'time',
                      label: 'Flight time',
                      children: `${display.fixed(flightTimeS / 60, 0)} min`,
                    },
                  ]
                : []),
              ...(landingArea
                ? areaItems(landingArea, plot.metresPerUnit, plot.unit, display)
                : []),
            ]}
          />
        </section>
      </Flex>
    </Card>
  );
}

/** Launch to landing [s], from the track's time column. */
function trackDurationS(series: DataSeries): number | undefined {
  const time = series.columns.findIndex((column) => column.key === 'time');
  const last = series.rows[series.rows.length - 1];
  return time < 0 || !last ? undefined : last[time];
}

function areaItems(
  area: LandingArea,
  metresPerUnit: number,
  unit: string,
  display: ReturnType<typeof usePlainNumbers>,
) {
  return area.regions.map((region) => ({
    key: `region-${region.probability}`,
    label: `${Math.round(region.probability * 100)} % of landings`,
    children: `within ${display.number(region.areaM2 / metresPerUnit ** 2, { significantDigits: 3 })} ${unit}² (${area.runs.length} runs)`,
  }));
}
