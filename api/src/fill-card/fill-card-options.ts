import { type FillCardOptions, InputError } from '@loftwright/buoyancy';
import type { FillCardQueryDto } from './dto/fill-card-query.dto';

/** The engine's field names of the card's options, and the query names the API reads them by. */
const QUERY_NAMES: Record<string, keyof FillCardQueryDto> = {
  fillerMassKg: 'fillerMassKg',
  freeLiftKg: 'freeLiftKg',
  'cylinder.waterVolumeM3': 'cylinderWaterVolumeM3',
  'cylinder.fillPressurePa': 'cylinderFillPressurePa',
  'cylinder.temperatureK': 'cylinderTemperatureK',
  'cylinder.count': 'cylinderCount',
};

/**
 * A plain decimal, as a person or a form writes it ("0.15", "-2", "1.2e3"). `Number` would also
 * take "0x10" or "0b1" and read them as 16 and 1 without a word.
 */
const PLAIN_DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** A query value as a number: absent stays absent, text that is not a number is refused. */
function numberOf(query: FillCardQueryDto, name: keyof FillCardQueryDto): number | undefined {
  const text = query[name]?.trim();
  if (text === undefined || text === '') return undefined;
  const value = PLAIN_DECIMAL.test(text) ? Number(text) : NaN;
  if (!Number.isFinite(value)) {
    throw new InputError(name, text, 'must be a plain decimal number in SI units, such as 0.15');
  }
  return value;
}

/** The card's options from the query; cylinders when any of their fields is given. */
export function fillCardOptions(query: FillCardQueryDto): FillCardOptions {
  const cylinderNames = [
    'cylinderWaterVolumeM3',
    'cylinderFillPressurePa',
    'cylinderTemperatureK',
    'cylinderCount',
  ] as const;
  const fillerMassKg = numberOf(query, 'fillerMassKg');
  const freeLiftKg = numberOf(query, 'freeLiftKg');
  const hasCylinder = cylinderNames.some((name) => numberOf(query, name) !== undefined);
  const count = numberOf(query, 'cylinderCount');
  return {
    ...(fillerMassKg === undefined ? {} : { fillerMassKg }),
    ...(freeLiftKg === undefined ? {} : { freeLiftKg }),
    ...(hasCylinder
      ? {
          // A missing one passes as undefined: the engine refuses it, naming the field.
          cylinder: {
            waterVolumeM3: numberOf(query, 'cylinderWaterVolumeM3') as number,
            fillPressurePa: numberOf(query, 'cylinderFillPressurePa') as number,
            temperatureK: numberOf(query, 'cylinderTemperatureK') as number,
            ...(count === undefined ? {} : { count }),
          },
        }
      : {}),
  };
}

/**
 * The engine's refusal with its fields renamed to the query's, so the 422 names what the caller
 * sent. Errors about the version's own inputs keep their names.
 */
export function inQueryNames(error: InputError): InputError {
  return new InputError(
    error.issues.map((issue) => ({ ...issue, field: QUERY_NAMES[issue.field] ?? issue.field })),
  );
}
