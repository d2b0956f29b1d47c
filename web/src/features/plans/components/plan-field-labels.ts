import type { InputFieldInfo } from '@loftwright/buoyancy';

const PLAN_FIELDS: Record<string, InputFieldInfo> = {
  title: { label: 'Title' },
  eventDate: { label: 'Date of the event' },
  'fill.temperatureK': { label: 'Gas temperature at filling', dimension: 'temperature' },
  'fill.pressurePa': { label: 'Gas pressure at filling', dimension: 'pressure' },
  'prices.currency': { label: 'Currency' },
  'prices.electricityPerKWh': { label: 'Electricity price', dimension: 'money' },
  'prices.cylinderEach': { label: 'One full cylinder', dimension: 'money' },
  'prices.bulkGasPerM3': { label: 'Delivered gas, per normal m³', dimension: 'money' },
  pricesDate: { label: 'Quoted on' },
  calculationId: { label: 'from' },
  versionNumber: { label: 'version' },
  count: { label: 'count', dimension: 'count' },
  volumeM3: { label: 'gas per envelope', dimension: 'volume' },
  diameterM: { label: 'diameter', dimension: 'length' },
  label: { label: 'name' },
};

/** The editor's own label for a field the server names: "Envelope 2 count". */
export function planLabel(field: string): InputFieldInfo | undefined {
  const line = /^lines\.(\d+)(?:\.(\w+))?$/.exec(field);
  if (line) {
    const envelope = `Envelope ${Number(line[1]) + 1}`;
    const info = line[2] ? PLAN_FIELDS[line[2]] : undefined;
    return info ? { ...info, label: `${envelope} ${info.label}` } : { label: envelope };
  }
  return PLAN_FIELDS[field];
}
