import { theme } from 'antd';
import { usePlotArea, useXAxisScale, useYAxisScale } from 'recharts';
import type { Point, TrackPlot } from './track-plot';

export interface MarkerNames {
  readonly launch: string;
  readonly burst: string;
  readonly landing: string;
}

const REGION_OPACITY: Record<string, number> = { '0.5': 0.35, '0.95': 0.15 };

/**
 * What the track chart draws inside its axes, in data coordinates through the axes' own scales:
 * range rings, the landing area's regions and runs, the track, and the three marked points.
 */
export function TrackLayers({
  plot,
  names,
  formatRing,
}: {
  plot: TrackPlot;
  names: MarkerNames;
  formatRing: (radius: number) => string;
}) {
  const { token } = theme.useToken();
  const xScale = useXAxisScale();
  const yScale = useYAxisScale();
  const area = usePlotArea();
  if (!xScale || !yScale || !area) return null;
  const at = ([east, north]: Point): [number, number] => [xScale(east) ?? 0, yScale(north) ?? 0];
  const [originX, originY] = at([0, 0]);
  const pixelsPerUnit = Math.abs((xScale(1) ?? 0) - (xScale(0) ?? 0));
  const path = (points: readonly Point[]) => points.map((point) => at(point).join(',')).join(' ');
  const clipId = 'drift-track-clip';
  return (
    <g>
      <clipPath id={clipId}>
        <rect x={area.x} y={area.y} width={area.width} height={area.height} />
      </clipPath>
      <g clipPath={`url(#${clipId})`}>
        <g aria-label="Range rings round the launch" role="list">
          {plot.rings.map((radius) => (
            <g key={radius} role="listitem" aria-label={`Range ring ${formatRing(radius)}`}>
              <circle
                cx={originX}
                cy={originY}
                r={radius * pixelsPerUnit}
                fill="none"
                stroke={token.colorBorder}
                strokeDasharray="3 3"
              />
              <text
                x={originX + (radius * pixelsPerUnit) / Math.SQRT2}
                y={originY - (radius * pixelsPerUnit) / Math.SQRT2}
                fontSize={11}
                fill={token.colorTextSecondary}
              >
                {formatRing(radius)}
              </text>
            </g>
          ))}
        </g>
        {plot.regions.map((region) => (
          <polygon
            key={region.probability}
            role="img"
            aria-label={`${Math.round(region.probability * 100)} % landing area`}
            points={path(region.points)}
            fill={token.colorWarning}
            fillOpacity={REGION_OPACITY[String(region.probability)] ?? 0.2}
            stroke={token.colorWarning}
          />
        ))}
        <g aria-hidden="true">
          {plot.runs.map((run, index) => {
            const [x, y] = at(run);
            return <circle key={index} cx={x} cy={y} r={1.5} fill={token.colorTextQuaternary} />;
          })}
        </g>
        <polyline
          points={path(plot.track)}
          fill="none"
          stroke={token.colorPrimary}
          strokeWidth={2}
          aria-hidden="true"
        />
      </g>
      <Marker at={at(plot.launch)} name={names.launch} text="Launch" colour={token.colorText} />
      <Marker at={at(plot.burst)} name={names.burst} text="Burst" colour={token.colorWarning} />
      <Marker
        at={at(plot.landing)}
        name={names.landing}
        text="Landing"
        colour={token.colorSuccess}
      />
    </g>
  );
}

function Marker({
  at: [x, y],
  name,
  text,
  colour,
}: {
  at: [number, number];
  name: string;
  text: string;
  colour: string;
}) {
  const { token } = theme.useToken();
  const background = token.colorBgContainer;
  return (
    <g role="img" aria-label={name}>
      <circle cx={x} cy={y} r={5} fill={colour} stroke={background} strokeWidth={1.5} />
      <text x={x + 7} y={y - 7} fontSize={12} fill={colour} aria-hidden="true">
        {text}
      </text>
    </g>
  );
}
