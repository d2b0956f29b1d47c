import { AIR_PRESSURE_RANGE_PA, AIR_TEMPERATURE_RANGE_K, KINDS } from '@loftwright/buoyancy';

export interface ValueRange {
  min: number;
  max: number;
}

type JsonSchema = Record<string, unknown>;

const asSchema = (value: unknown): JsonSchema =>
  value && typeof value === 'object' ? (value as JsonSchema) : {};

/** A property of a JSON Schema, looked for through list items and every variant of a union. */
function propertyOf(schema: JsonSchema, key: string): JsonSchema | undefined {
  const own = asSchema(schema.properties)[key];
  if (own) return asSchema(own);
  const inner = [
    ...((schema.oneOf ?? []) as unknown[]),
    ...((schema.anyOf ?? []) as unknown[]),
    ...(schema.items ? [schema.items] : []),
  ];
  for (const candidate of inner) {
    const found = propertyOf(asSchema(candidate), key);
    if (found) return found;
  }
  return undefined;
}

/**
 * The range the engine's lift-measurement kind publishes in its JSON Schema for a field
 * ("readings.ballastMassKg"): the numbers the server checks each logged reading against when it
 * reduces the log with that kind.
 */
function liftMeasurementRange(path: string): ValueRange {
  let schema: JsonSchema | undefined = asSchema(
    KINDS.find((kind) => kind.id === 'lift-measurement')?.inputSchema,
  );
  for (const key of path.split('.')) schema = schema && propertyOf(schema, key);
  const { minimum, maximum } = schema ?? {};
  if (typeof minimum !== 'number' || typeof maximum !== 'number') {
    throw new Error(`The engine publishes no range for lift-measurement ${path}`);
  }
  return { min: minimum, max: maximum };
}

/**
 * What a fill log accepts, in SI, as the server checks it (reduceFillLog in the engine): the air
 * against the engine's air-density ranges, each reading against the lift-measurement kind.
 */
export const FILL_LOG_RANGES = {
  temperatureK: AIR_TEMPERATURE_RANGE_K,
  pressurePa: AIR_PRESSURE_RANGE_PA,
  /** A share, shown in %. */
  relativeHumidity: liftMeasurementRange('prediction.ambient.humidity.relativeHumidity'),
  timeS: liftMeasurementRange('readings.timeS'),
  ballastMassKg: liftMeasurementRange('readings.ballastMassKg'),
  scaleReadingKg: liftMeasurementRange('readings.scaleReadingKg'),
  netLiftKg: liftMeasurementRange('readings.netLiftKg'),
  scaleResolutionKg: liftMeasurementRange('instrument.scaleResolutionKg'),
  ballastToleranceKg: liftMeasurementRange('instrument.ballastToleranceKg'),
} as const satisfies Record<string, ValueRange>;

/** Whether a value that reads lies outside its range (an empty field is not outside). */
export const outsideRange = (value: number | undefined, range: ValueRange) =>
  value !== undefined && (!Number.isFinite(value) || value < range.min || value > range.max);
