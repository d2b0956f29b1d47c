import { useId } from 'react';
import { usePlotArea, useXAxisScale, useYAxisScale } from 'recharts';
import type { PlacedTile } from './track-tiles';

/**
 * How much of each tile shows: faded so the rings, regions and track drawn over it stay the
 * chart's subject (common practice, no published source).
 */
export const TILE_OPACITY = 0.55;

/**
 * The base map under the drift track: each tile an SVG image at its box east and north of launch,
 * through the axes' own scales, clipped to the plot area. Drawn before the chart's other layers,
 * so everything else lies over it.
 */
export function TrackBaseMap({ tiles }: { tiles: readonly PlacedTile[] }) {
  const xScale = useXAxisScale();
  const yScale = useYAxisScale();
  const area = usePlotArea();
  const clipId = `drift-track-map-${useId().replace(/[^\w-]/g, '')}`;
  if (!xScale || !yScale || !area || tiles.length === 0) return null;
  return (
    <g data-layer="base-map" aria-hidden="true">
      <clipPath id={clipId}>
        <rect x={area.x} y={area.y} width={area.width} height={area.height} />
      </clipPath>
      <g clipPath={`url(#${clipId})`} opacity={TILE_OPACITY}>
        {tiles.map((tile) => {
          const left = xScale(tile.west) ?? 0;
          const right = xScale(tile.east) ?? 0;
          const top = yScale(tile.north) ?? 0;
          const bottom = yScale(tile.south) ?? 0;
          return (
            <image
              key={`${tile.url}@${tile.west}`}
              href={tile.url}
              x={left}
              y={top}
              width={right - left}
              height={bottom - top}
              preserveAspectRatio="none"
            />
          );
        })}
      </g>
    </g>
  );
}
