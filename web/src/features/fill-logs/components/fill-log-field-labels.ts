import type { InputFieldInfo } from '@loftwright/buoyancy';

const FILL_LOG_FIELDS: Record<string, InputFieldInfo> = {
  'ambient.temperatureK': { label: 'Air temperature', dimension: 'temperature' },
  'ambient.pressurePa': { label: 'Air pressure (absolute)', dimension: 'pressure' },
  'ambient.relativeHumidity': { label: 'Relative humidity', dimension: 'fraction' },
  timeS: { label: 'time since filling', dimension: 'time' },
  ballastMassKg: { label: 'ballast mass', dimension: 'mass' },
  scaleReadingKg: { label: 'scale reading', dimension: 'mass' },
  netLiftKg: { label: 'net lift', dimension: 'mass' },
  'instrument.scaleResolutionKg': { label: 'Scale resolution', dimension: 'mass' },
  'instrument.ballastToleranceKg': { label: 'Ballast tolerance (±)', dimension: 'mass' },
  filledAt: { label: 'Filled at' },
  place: { label: 'Place' },
  envelopeLabel: { label: 'Envelope' },
  envelopeId: { label: 'Library envelope' },
  gasSource: { label: 'Gas source' },
  note: { label: 'Note' },
};

/** The form's own label for a field the server names: "Reading 2 ballast mass". */
export function fillLogLabel(field: string): InputFieldInfo | undefined {
  const reading = /^readings\.(\d+)\.(\w+)$/.exec(field);
  if (reading) {
    const info = FILL_LOG_FIELDS[reading[2] ?? ''];
    return info && { ...info, label: `Reading ${Number(reading[1]) + 1} ${info.label}` };
  }
  return FILL_LOG_FIELDS[field];
}
