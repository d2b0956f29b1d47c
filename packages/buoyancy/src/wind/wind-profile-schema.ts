import * as z from 'zod';
import { standardAltitudeForPressureM } from '../atmosphere/standard-atmosphere.js';
import { quantity } from '../schema/quantity-schema.js';
import {
  hypsometricHeightM,
  standardThicknessHeightM,
  virtualTemperatureK,
} from './hypsometric.js';

/** Heights a wind profile may cover [m above mean sea level]. */
export const WIND_HEIGHT_RANGE_M = { min: -500, max: 50000 } as const;
/** Pressures a level may be given at [Pa]: 50 Pa lies above 50 km in any atmosphere. */
export const WIND_PRESSURE_RANGE_PA = { min: 50, max: 110000 } as const;
/** Wind speeds accepted [m/s]: above the strongest jet-stream winds measured (about 110 m/s). */
export const WIND_SPEED_RANGE_MS = { min: 0, max: 150 } as const;
/** Air temperatures of a level [K]: −100 °C (the coldest mesosphere is above 50 km) to +70 °C. */
export const WIND_TEMPERATURE_RANGE_K = { min: 173.15, max: 343.15 } as const;
/** Dew points of a level [K]: as low as soundings report them in the stratosphere, −123 °C. */
export const WIND_DEW_POINT_RANGE_K = { min: 150, max: 343.15 } as const;
/** Layers in one profile: at least two, so that there is something to interpolate. */
export const WIND_LAYER_COUNT_RANGE = { min: 2, max: 5000 } as const;

/** A direction in degrees clockwise from true north, 0 to 360 (both mean north). */
function directionDeg(description: string) {
  return quantity('angle', 0, 360, description);
}

/**
 * One level of a wind profile: its height above mean sea level or its pressure (or both, as a
 * sounding's surface line gives them), the wind there (meteorological direction, the one it blows
 * FROM, clockwise from true north; speed), and optionally the air temperature and dew point.
 */
export const windLayerSchema = z
  .object({
    heightM: quantity(
      'length',
      WIND_HEIGHT_RANGE_M.min,
      WIND_HEIGHT_RANGE_M.max,
      'height of the level above mean sea level',
    ).optional(),
    pressurePa: quantity(
      'pressure',
      WIND_PRESSURE_RANGE_PA.min,
      WIND_PRESSURE_RANGE_PA.max,
      'air pressure at the level',
    ).optional(),
    directionDeg: directionDeg('direction the wind blows from, clockwise from true north'),
    speedMS: quantity('velocity', WIND_SPEED_RANGE_MS.min, WIND_SPEED_RANGE_MS.max, 'wind speed'),
    temperatureK: quantity(
      'temperature',
      WIND_TEMPERATURE_RANGE_K.min,
      WIND_TEMPERATURE_RANGE_K.max,
      'air temperature at the level',
    ).optional(),
    dewPointK: quantity(
      'temperature',
      WIND_DEW_POINT_RANGE_K.min,
      WIND_DEW_POINT_RANGE_K.max,
      'dew point at the level',
    ).optional(),
  })
  .strict()
  .superRefine((layer, context) => {
    if (layer.heightM === undefined && layer.pressurePa === undefined) {
      context.addIssue({
        code: 'custom',
        path: ['heightM'],
        message: 'is required when the level has no pressure',
      });
    }
    if (layer.dewPointK !== undefined) {
      if (layer.temperatureK === undefined) {
        context.addIssue({
          code: 'custom',
          path: ['dewPointK'],
          message: 'needs the air temperature of the level beside it',
        });
      } else if (layer.dewPointK > layer.temperatureK) {
        context.addIssue({
          code: 'custom',
          path: ['dewPointK'],
          message: `must not be above the air temperature (${layer.temperatureK} K)`,
        });
      }
    }
  });

export type WindLayerInput = z.input<typeof windLayerSchema>;
export type WindLayerValues = z.output<typeof windLayerSchema>;

/** How each level's height was found. */
export type HeightSource = 'given' | 'hypsometric' | 'standard-thickness' | 'pressure-altitude';

export interface LayerHeights {
  readonly heightsM: readonly number[];
  /** Pressure of each level where given [Pa]. */
  readonly pressuresPa: readonly (number | undefined)[];
  readonly sources: readonly HeightSource[];
}

/** The last level with a known pressure, from which the next pressure-only level hangs. */
export interface HeightAnchor {
  readonly heightM: number;
  readonly pressurePa: number;
  readonly virtualTemperatureK: number | undefined;
}

/**
 * Height of one level given the anchor before it, and the anchor for the next level. A level with
 * a height keeps it. A pressure-only level hangs from the anchor: by the hypsometric equation with
 * the mean virtual temperature of the two levels when both have a temperature, else by the
 * thickness of the same pressure interval in the 1976 standard atmosphere. With no anchor it is
 * placed at its standard-atmosphere pressure altitude.
 */
export function nextLayerHeight(
  anchor: HeightAnchor | undefined,
  layer: WindLayerValues,
): { heightM: number; source: HeightSource; anchor: HeightAnchor | undefined } {
  const { pressurePa } = layer;
  const virtualK =
    layer.temperatureK !== undefined && pressurePa !== undefined
      ? virtualTemperatureK(layer.temperatureK, pressurePa, layer.dewPointK)
      : undefined;
  let heightM: number;
  let source: HeightSource;
  if (layer.heightM !== undefined) {
    heightM = layer.heightM;
    source = 'given';
  } else {
    // Schema: a level without height has a pressure.
    const p = pressurePa as number;
    if (!anchor) {
      heightM = standardAltitudeForPressureM(p);
      source = 'pressure-altitude';
    } else if (anchor.virtualTemperatureK !== undefined && virtualK !== undefined) {
      heightM = hypsometricHeightM(
        anchor.heightM,
        anchor.pressurePa,
        anchor.virtualTemperatureK,
        p,
        virtualK,
      );
      source = 'hypsometric';
    } else {
      heightM = standardThicknessHeightM(anchor.heightM, anchor.pressurePa, p);
      source = 'standard-thickness';
    }
  }
  return {
    heightM,
    source,
    anchor:
      pressurePa !== undefined ? { heightM, pressurePa, virtualTemperatureK: virtualK } : anchor,
  };
}

/** Heights of the levels in order (see `nextLayerHeight`). */
export function resolveLayerHeights(layers: readonly WindLayerValues[]): LayerHeights {
  const heightsM: number[] = [];
  const pressuresPa: (number | undefined)[] = [];
  const sources: HeightSource[] = [];
  let anchor: HeightAnchor | undefined;
  for (const layer of layers) {
    const next = nextLayerHeight(anchor, layer);
    heightsM.push(next.heightM);
    pressuresPa.push(layer.pressurePa);
    sources.push(next.source);
    anchor = next.anchor;
  }
  return { heightsM, pressuresPa, sources };
}

/**
 * A wind profile as inputs: at least two levels, in order of increasing height (decreasing
 * pressure), heights strictly increasing once pressure levels are converted. Refusals name
 * `layers.N.field` (prefixed by where the profile sits in a kind's inputs, e.g. `wind.`).
 */
export const windProfileSchema = z
  .object({
    layers: z
      .array(windLayerSchema)
      .min(WIND_LAYER_COUNT_RANGE.min, {
        message: `needs at least ${WIND_LAYER_COUNT_RANGE.min} levels`,
      })
      .max(WIND_LAYER_COUNT_RANGE.max, {
        message: `takes at most ${WIND_LAYER_COUNT_RANGE.max} levels`,
      })
      .meta({ description: 'levels, lowest first', itemLabel: 'level' }),
  })
  .strict()
  .superRefine((profile, context) => {
    // Zod runs this even when a level was refused; such a level cannot be placed, and its own
    // issue already says why.
    if (!profile.layers.every(isPlaceable)) return;
    const { heightsM } = resolveLayerHeights(profile.layers);
    heightsM.forEach((heightM, index) => {
      const layer = profile.layers[index];
      const field = layer?.heightM !== undefined ? 'heightM' : 'pressurePa';
      if (field === 'pressurePa' && !isWithinHeights(heightM)) {
        context.addIssue({
          code: 'custom',
          path: ['layers', index, field],
          message: `puts the level at ${Math.round(heightM)} m, outside ${WIND_HEIGHT_RANGE_M.min} to ${WIND_HEIGHT_RANGE_M.max} m`,
        });
        return;
      }
      const below = heightsM[index - 1];
      if (below !== undefined && !(heightM > below)) {
        context.addIssue({
          code: 'custom',
          path: ['layers', index, field],
          message:
            field === 'heightM'
              ? `must be above the level before it (${round(below)} m)`
              : `must be below the pressure of the level before it: it puts the level at ${round(heightM)} m, not above ${round(below)} m`,
        });
      }
    });
  });

function isPlaceable(layer: WindLayerValues): boolean {
  const within = (value: number | undefined, range: { min: number; max: number }) =>
    value === undefined || (Number.isFinite(value) && value >= range.min && value <= range.max);
  return (
    (layer.heightM !== undefined || layer.pressurePa !== undefined) &&
    within(layer.heightM, WIND_HEIGHT_RANGE_M) &&
    within(layer.pressurePa, WIND_PRESSURE_RANGE_PA) &&
    within(layer.temperatureK, WIND_TEMPERATURE_RANGE_K) &&
    within(layer.dewPointK, WIND_DEW_POINT_RANGE_K) &&
    (layer.dewPointK === undefined ||
      (layer.temperatureK !== undefined && layer.dewPointK <= layer.temperatureK))
  );
}

function isWithinHeights(heightM: number): boolean {
  return heightM >= WIND_HEIGHT_RANGE_M.min && heightM <= WIND_HEIGHT_RANGE_M.max;
}

function round(value: number): number {
  return Math.round(value * 10) / 10;
}

export type WindProfileInput = z.input<typeof windProfileSchema>;
export type WindProfileValues = z.output<typeof windProfileSchema>;
