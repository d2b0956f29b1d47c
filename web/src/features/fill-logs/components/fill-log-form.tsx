import { Alert, Button, Form, Input, Modal, Select, Space, Typography } from 'antd';
import {
  type Dimension,
  type FillReading,
  type InputFieldInfo,
  formatQuantity,
  formatRange,
  INSTRUMENT_DEFAULTS,
  type NumberFormat,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useId, useState } from 'react';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { FieldFormError } from '@/components/errors/field-form-error';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import {
  describeUnreadable,
  type UnreadableField,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import { type FillLogDraft, GAS_SOURCES, useCreateFillLog } from '../api/fill-logs-api';
import { airOfVersion, NO_AIR, type VersionAir } from '../lib/air-of-version';
import { FILL_LOG_RANGES, outsideRange, type ValueRange } from '../lib/fill-log-ranges';

interface ReadingRow {
  kind: 'ballast' | 'direct';
  timeS?: number;
  ballastMassKg?: number;
  scaleReadingKg?: number;
  netLiftKg?: number;
}

const localNow = () => {
  const now = new Date();
  now.setMinutes(now.getMinutes() - now.getTimezoneOffset());
  return now.toISOString().slice(0, 16);
};

function toReading(row: ReadingRow): FillReading | undefined {
  if (row.timeS === undefined) return undefined;
  if (row.kind === 'ballast') {
    if (row.ballastMassKg === undefined || row.scaleReadingKg === undefined) return undefined;
    return {
      kind: 'ballast',
      timeS: row.timeS,
      ballastMassKg: row.ballastMassKg,
      scaleReadingKg: row.scaleReadingKg,
    };
  }
  if (row.netLiftKg === undefined) return undefined;
  return { kind: 'direct', timeS: row.timeS, netLiftKg: row.netLiftKg };
}

/** The version a fill is logged against, as far as it has been read from the server. */
export type FillLogVersion =
  | { status: 'pending' }
  | { status: 'error'; message: string }
  | { status: 'success'; inputs: unknown };

const startingAir = (version: FillLogVersion): VersionAir =>
  version.status === 'success' ? airOfVersion(version.inputs) : NO_AIR;

/** A field whose value reads but lies outside what the server accepts. */
interface RangedField {
  label: string;
  value: number | undefined;
  range: ValueRange;
  dimension: Dimension;
}

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
  gasSource: { label: 'Gas source' },
  note: { label: 'Note' },
};

/** The form's own label for a field the server names: "Reading 2 ballast mass". */
function fillLogLabel(field: string): InputFieldInfo | undefined {
  const reading = /^readings\.(\d+)\.(\w+)$/.exec(field);
  if (reading) {
    const info = FILL_LOG_FIELDS[reading[2] ?? ''];
    return info && { ...info, label: `Reading ${Number(reading[1]) + 1} ${info.label}` };
  }
  return FILL_LOG_FIELDS[field];
}

/** One line saying where the starting air comes from, or why it is sea level. */
function airNote(
  version: FillLogVersion,
  versionNumber: number,
  air: VersionAir,
  unitSystem: UnitSystem,
  numberFormat: NumberFormat,
): string | undefined {
  const show = (value: number, dimension: Dimension) =>
    formatQuantity(value, dimension, unitSystem, {
      numberFormat,
      significantDigits: 6,
      trimZeros: true,
      grouping: false,
    }).text;
  const seaLevel = `starting from ${show(NO_AIR.temperatureK, 'temperature')}, ${show(NO_AIR.pressurePa, 'pressure')}`;
  if (version.status === 'pending') return undefined;
  if (version.status === 'error') {
    return `The version’s air could not be read (${version.message}); ${seaLevel}`;
  }
  const { origin } = air;
  if (origin.kind === 'none') return `This version names no air; ${seaLevel}`;
  const where =
    origin.kind === 'measured'
      ? 'measured air'
      : `the 1976 standard atmosphere at ${show(origin.altitudeM, 'length')}${
          origin.temperatureOffsetK === 0
            ? ''
            : `, ISA ${origin.temperatureOffsetK > 0 ? '+' : '−'} ${show(Math.abs(origin.temperatureOffsetK), 'temperatureDifference')}`
        }`;
  const dewPoint =
    air.dewPointK === undefined
      ? ''
      : `; relative humidity from its dew point of ${show(air.dewPointK, 'temperature')}`;
  return `Starting from the air version ${versionNumber} was computed for: ${where}${dewPoint}.`;
}

/** Logs a real fill of one version: when, where, the air, and the lift read on the scale. */
export function FillLogForm({
  calculationId,
  versionNumber,
  version,
  unitSystem,
  open,
  onClose,
  onCreated,
}: {
  calculationId: string;
  versionNumber: number;
  /** The version's inputs: the fill's air starts from the air it was computed for. */
  version: FillLogVersion;
  unitSystem: UnitSystem;
  open: boolean;
  onClose: () => void;
  onCreated: (id: string) => void;
}) {
  const create = useCreateFillLog(calculationId);
  const idPrefix = useId();
  const { numberFormat } = useReadingPreferences();
  const [unreadable, unreadableRegistry] = useUnreadableFields();
  const air = startingAir(version);
  const [filledAt, setFilledAt] = useState(localNow);
  const [place, setPlace] = useState('');
  const [envelopeLabel, setEnvelopeLabel] = useState('');
  const [gasSource, setGasSource] = useState<string>('cylinder');
  const [temperatureK, setTemperatureK] = useState<number | undefined>(air.temperatureK);
  const [pressurePa, setPressurePa] = useState<number | undefined>(air.pressurePa);
  const [relativeHumidity, setRelativeHumidity] = useState<number | undefined>(
    air.relativeHumidity,
  );
  // The version arriving after the dialog opened (the fields are not shown until then): the air
  // starts from it, as React recommends, by adjusting state while rendering.
  const [airFrom, setAirFrom] = useState(version.status);
  if (airFrom !== version.status) {
    setAirFrom(version.status);
    setTemperatureK(air.temperatureK);
    setPressurePa(air.pressurePa);
    setRelativeHumidity(air.relativeHumidity);
  }
  const [scaleResolutionKg, setScaleResolutionKg] = useState<number | undefined>(
    INSTRUMENT_DEFAULTS.scaleResolutionKg,
  );
  const [ballastToleranceKg, setBallastToleranceKg] = useState<number | undefined>(
    INSTRUMENT_DEFAULTS.ballastToleranceKg,
  );
  const [note, setNote] = useState('');
  const [rows, setRows] = useState<ReadingRow[]>([{ kind: 'ballast', timeS: 0 }]);
  const setRow = (index: number, change: Partial<ReadingRow>) =>
    setRows((current) => current.map((row, i) => (i === index ? { ...row, ...change } : row)));

  const readings = rows.map(toReading);
  const complete =
    temperatureK !== undefined &&
    pressurePa !== undefined &&
    filledAt !== '' &&
    scaleResolutionKg !== undefined &&
    ballastToleranceKg !== undefined &&
    readings.every((reading) => reading !== undefined);

  // The server's ranges, checked here too: each field says it as it is typed, and saving waits.
  const ranged: RangedField[] = [
    {
      label: 'Air temperature',
      value: temperatureK,
      range: FILL_LOG_RANGES.temperatureK,
      dimension: 'temperature',
    },
    {
      label: 'Air pressure (absolute)',
      value: pressurePa,
      range: FILL_LOG_RANGES.pressurePa,
      dimension: 'pressure',
    },
    {
      label: 'Relative humidity',
      value: relativeHumidity,
      range: FILL_LOG_RANGES.relativeHumidity,
      dimension: 'fraction',
    },
    {
      label: 'Scale resolution',
      value: scaleResolutionKg,
      range: FILL_LOG_RANGES.scaleResolutionKg,
      dimension: 'mass',
    },
    {
      label: 'Ballast tolerance (±)',
      value: ballastToleranceKg,
      range: FILL_LOG_RANGES.ballastToleranceKg,
      dimension: 'mass',
    },
    ...rows.flatMap((row, index): RangedField[] => [
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
  const heldBack: UnreadableField[] = [
    ...unreadable,
    ...ranged
      .filter((field) => outsideRange(field.value, field.range))
      .map((field) => ({
        label: field.label,
        reason: `must be ${formatRange(field.range.min, field.range.max, field.dimension, { unitSystem, numberFormat })}`,
      })),
  ];
  const pending = version.status === 'pending';
  const airOrigin = airNote(version, versionNumber, air, unitSystem, numberFormat);

  const submit = () => {
    if (!complete || heldBack.length > 0 || pending) return;
    const draft: FillLogDraft = {
      filledAt: new Date(filledAt).toISOString(),
      place,
      envelopeLabel,
      gasSource,
      ambient: {
        temperatureK,
        pressurePa,
        ...(relativeHumidity === undefined ? {} : { relativeHumidity }),
      },
      readings: readings as FillReading[],
      instrument: {
        scaleResolutionKg: scaleResolutionKg as number,
        ballastToleranceKg: ballastToleranceKg as number,
      },
      note,
    };
    create.mutate(
      { versionNumber, draft },
      {
        onSuccess: (log) => {
          onCreated(log.id);
          onClose();
        },
      },
    );
  };

  return (
    <Modal
      open={open}
      title={`Log a fill of version ${versionNumber}`}
      onCancel={onClose}
      width={720}
      okText="Save fill log"
      okButtonProps={{
        disabled: !complete || heldBack.length > 0 || pending,
        loading: create.isPending,
      }}
      onOk={submit}
      loading={pending}
      destroyOnHidden
    >
      <UnreadableFieldsContext.Provider value={unreadableRegistry}>
        <Form layout="vertical" component="div" requiredMark={false}>
          <Space wrap style={{ width: '100%' }}>
            <Form.Item label="Filled at" htmlFor={`${idPrefix}-at`}>
              <Input
                id={`${idPrefix}-at`}
                type="datetime-local"
                value={filledAt}
                onChange={(event) => setFilledAt(event.target.value)}
              />
            </Form.Item>
            <Form.Item label="Place" htmlFor={`${idPrefix}-place`}>
              <Input
                id={`${idPrefix}-place`}
                value={place}
                onChange={(event) => setPlace(event.target.value)}
                maxLength={200}
              />
            </Form.Item>
            <Form.Item label="Envelope" htmlFor={`${idPrefix}-envelope`}>
              <Input
                id={`${idPrefix}-envelope`}
                placeholder="Which one: serial, colour"
                value={envelopeLabel}
                onChange={(event) => setEnvelopeLabel(event.target.value)}
                maxLength={200}
              />
            </Form.Item>
            <Form.Item label="Gas source">
              <Select
                aria-label="Gas source"
                style={{ width: 220 }}
                value={gasSource}
                options={GAS_SOURCES.map((source) => ({ ...source }))}
                onChange={setGasSource}
              />
            </Form.Item>
          </Space>
          <Typography.Title level={5}>Air at the fill</Typography.Title>
          {airOrigin ? (
            <Typography.Paragraph type="secondary" data-air-origin={air.origin.kind}>
              {airOrigin}
            </Typography.Paragraph>
          ) : null}
          <Space wrap align="start">
            <Form.Item label="Air temperature" htmlFor={`${idPrefix}-t`}>
              <QuantityInput
                id={`${idPrefix}-t`}
                label="Air temperature"
                dimension="temperature"
                value={temperatureK}
                onChange={setTemperatureK}
                unitSystem={unitSystem}
                range={FILL_LOG_RANGES.temperatureK}
              />
            </Form.Item>
            <Form.Item label="Air pressure (absolute)" htmlFor={`${idPrefix}-p`}>
              <QuantityInput
                id={`${idPrefix}-p`}
                label="Air pressure (absolute)"
                dimension="pressure"
                value={pressurePa}
                onChange={setPressurePa}
                unitSystem={unitSystem}
                range={FILL_LOG_RANGES.pressurePa}
              />
            </Form.Item>
            <Form.Item label="Relative humidity (optional)" htmlFor={`${idPrefix}-rh`}>
              <QuantityInput
                id={`${idPrefix}-rh`}
                label="Relative humidity"
                dimension="fraction"
                value={relativeHumidity}
                onChange={setRelativeHumidity}
                unitSystem={unitSystem}
                range={FILL_LOG_RANGES.relativeHumidity}
              />
            </Form.Item>
          </Space>
          <Typography.Title level={5}>Lift readings</Typography.Title>
          <Typography.Paragraph type="secondary">
            Tie the envelope to a known ballast standing on a scale: the net lift is the ballast
            less what the scale shows. Or enter a net lift read directly from a spring balance or
            load cell.
          </Typography.Paragraph>
          <Space wrap align="start" role="group" aria-label="Instruments">
            <Form.Item
              label="Scale resolution"
              htmlFor={`${idPrefix}-resolution`}
              extra="The smallest step the scale, spring or load cell shows."
            >
              <QuantityInput
                id={`${idPrefix}-resolution`}
                label="Scale resolution"
                dimension="mass"
                value={scaleResolutionKg}
                onChange={setScaleResolutionKg}
                unitSystem={unitSystem}
                range={FILL_LOG_RANGES.scaleResolutionKg}
              />
            </Form.Item>
            <Form.Item
              label="Ballast tolerance (±)"
              htmlFor={`${idPrefix}-tolerance`}
              extra="How far the ballast may be off its stated mass."
            >
              <QuantityInput
                id={`${idPrefix}-tolerance`}
                label="Ballast tolerance (±)"
                dimension="mass"
                value={ballastToleranceKg}
                onChange={setBallastToleranceKg}
                unitSystem={unitSystem}
                range={FILL_LOG_RANGES.ballastToleranceKg}
              />
            </Form.Item>
          </Space>
          {rows.map((row, index) => (
            <Space key={index} wrap align="start" aria-label={`Reading ${index + 1}`} role="group">
              <Form.Item label={`Reading ${index + 1}`}>
                <Select
                  aria-label={`Reading ${index + 1} kind`}
                  style={{ width: 170 }}
                  value={row.kind}
                  options={[
                    { value: 'ballast', label: 'Ballast and scale' },
                    { value: 'direct', label: 'Net lift read directly' },
                  ]}
                  onChange={(kind: ReadingRow['kind']) => setRow(index, { kind })}
                />
              </Form.Item>
              <Form.Item label="Time since filling">
                <QuantityInput
                  label={`Reading ${index + 1} time since filling`}
                  dimension="time"
                  value={row.timeS}
                  onChange={(timeS) => setRow(index, { timeS })}
                  unitSystem={unitSystem}
                  range={FILL_LOG_RANGES.timeS}
                />
              </Form.Item>
              {row.kind === 'ballast' ? (
                <>
                  <Form.Item label="Ballast mass">
                    <QuantityInput
                      label={`Reading ${index + 1} ballast mass`}
                      dimension="mass"
                      value={row.ballastMassKg}
                      onChange={(ballastMassKg) => setRow(index, { ballastMassKg })}
                      unitSystem={unitSystem}
                      range={FILL_LOG_RANGES.ballastMassKg}
                    />
                  </Form.Item>
                  <Form.Item label="Scale reading">
                    <QuantityInput
                      label={`Reading ${index + 1} scale reading`}
                      dimension="mass"
                      value={row.scaleReadingKg}
                      onChange={(scaleReadingKg) => setRow(index, { scaleReadingKg })}
                      unitSystem={unitSystem}
                      range={FILL_LOG_RANGES.scaleReadingKg}
                    />
                  </Form.Item>
                </>
              ) : (
                <Form.Item label="Net lift">
                  <QuantityInput
                    label={`Reading ${index + 1} net lift`}
                    dimension="mass"
                    value={row.netLiftKg}
                    onChange={(netLiftKg) => setRow(index, { netLiftKg })}
                    unitSystem={unitSystem}
                    range={FILL_LOG_RANGES.netLiftKg}
                  />
                </Form.Item>
              )}
            </Space>
          ))}
          <Space>
            <Button
              onClick={() =>
                setRows((current) => [
                  ...current,
                  {
                    kind: current.at(-1)?.kind ?? 'ballast',
                    ballastMassKg: current.at(-1)?.ballastMassKg,
                  },
                ])
              }
            >
              Add a reading
            </Button>
            {rows.length > 1 ? (
              <Button onClick={() => setRows((current) => current.slice(0, -1))}>
                Remove the last reading
              </Button>
            ) : null}
          </Space>
          <Form.Item label="Note" htmlFor={`${idPrefix}-note`} style={{ marginTop: 16 }}>
            <Input.TextArea
              id={`${idPrefix}-note`}
              value={note}
              onChange={(event) => setNote(event.target.value)}
              maxLength={2000}
              rows={2}
            />
          </Form.Item>
          {heldBack.length > 0 ? (
            <Alert
              type="error"
              showIcon
              title={`Not saved until these are put right: ${describeUnreadable(heldBack)}`}
            />
          ) : null}
          <FieldFormError error={create.error} unitSystem={unitSystem} labels={fillLogLabel} />
        </Form>
      </UnreadableFieldsContext.Provider>
    </Modal>
  );
}
