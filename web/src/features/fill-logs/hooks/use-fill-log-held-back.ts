import { type Dimension, formatRange, type UnitSystem } from '@loftwright/buoyancy';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { type UnreadableField, useUnreadableFields } from '@/components/reading/unreadable-fields';
import { FILL_LOG_RANGES, outsideRange, type ValueRange } from '../lib/fill-log-ranges';
import type { FillLogFields } from './use-fill-log-fields';

/** A field whose value reads but lies outside what the server accepts. */
interface RangedField {
  label: string;
  value: number | undefined;
  range: ValueRange;
  dimension: Dimension;
}

/** Each number of the form with the range the server checks it against. */
const rangedFields = (fields: FillLogFields): RangedField[] => [
  {
    label: 'Air temperature',
    value: fields.temperatureK,
    range: FILL_LOG_RANGES.temperatureK,
    dimension: 'temperature',
  },
  {
    label: 'Air pressure (absolute)',
    value: fields.pressurePa,
    range: FILL_LOG_RANGES.pressurePa,
    dimension: 'pressure',
  },
  {
    label: 'Relative humidity',
    value: fields.relativeHumidity,
    range: FILL_LOG_RANGES.relativeHumidity,
    dimension: 'fraction',
  },
  {
    label: 'Scale resolution',
    value: fields.scaleResolutionKg,
    range: FILL_LOG_RANGES.scaleResolutionKg,
    dimension: 'mass',
  },
  {
    label: 'Ballast tolerance (±)',
    value: fields.ballastToleranceKg,
    range: FILL_LOG_RANGES.ballastToleranceKg,
    dimension: 'mass',
  },
  ...fields.rows.flatMap((row, index): RangedField[] => [
    {
      label: `Reading ${index + 1} time since filling`,
      value: row.timeS,
      range: FILL_LOG_RANGES.timeS,
      dimension: 'time',
    },
    ...(row.kind === 'ballast'
      ? [
          {
            label: `Reading ${index + 1} ballast mass`,
            value: row.ballastMassKg,
            range: FILL_LOG_RANGES.ballastMassKg,
            dimension: 'mass' as const,
          },
          {
            label: `Reading ${index + 1} scale reading`,
            value: row.scaleReadingKg,
            range: FILL_LOG_RANGES.scaleReadingKg,
            dimension: 'mass' as const,
          },
        ]
      : [
          {
            label: `Reading ${index + 1} net lift`,
            value: row.netLiftKg,
            range: FILL_LOG_RANGES.netLiftKg,
            dimension: 'mass' as const,
          },
        ]),
  ]),
];

/**
 * What holds the fill log back from saving: fields whose text does not read (reported through
 * the registry, to give the form's context) and values outside the server's ranges, checked
 * here too so each field says it as it is typed.
 */
export function useFillLogHeldBack(fields: FillLogFields, unitSystem: UnitSystem) {
  const { numberFormat } = useReadingPreferences();
  const [unreadable, unreadableRegistry] = useUnreadableFields();
  const heldBack: UnreadableField[] = [
    ...unreadable,
    ...rangedFields(fields)
      .filter((field) => outsideRange(field.value, field.range))
      .map((field) => ({
        label: field.label,
        reason: `must be ${formatRange(field.range.min, field.range.max, field.dimension, { unitSystem, numberFormat })}`,
      })),
  ];
  return { heldBack, unreadableRegistry };
}
