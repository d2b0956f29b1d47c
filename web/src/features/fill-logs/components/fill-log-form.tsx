import { Button, Form, Input, Modal, Select, Space, Typography } from 'antd';
import type { FillReading, UnitSystem } from '@loftwright/buoyancy';
import { useId, useState } from 'react';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { FormError } from '@/components/errors/form-error';
import { type FillLogDraft, GAS_SOURCES, useCreateFillLog } from '../api/fill-logs-api';

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

/** Logs a real fill of one version: when, where, the air, and the lift read on the scale. */
export function FillLogForm({
  calculationId,
  versionNumber,
  unitSystem,
  open,
  onClose,
  onCreated,
}: {
  calculationId: string;
  versionNumber: number;
  unitSystem: UnitSystem;
  open: boolean;
  onClose: () => void;
  onCreated: (id: string) => void;
}) {
  const create = useCreateFillLog(calculationId);
  const idPrefix = useId();
  const [filledAt, setFilledAt] = useState(localNow);
  const [place, setPlace] = useState('');
  const [envelopeLabel, setEnvelopeLabel] = useState('');
  const [gasSource, setGasSource] = useState<string>('cylinder');
  const [temperatureK, setTemperatureK] = useState<number | undefined>(288.15);
  const [pressurePa, setPressurePa] = useState<number | undefined>(101325);
  const [relativeHumidity, setRelativeHumidity] = useState<number | undefined>();
  const [note, setNote] = useState('');
  const [rows, setRows] = useState<ReadingRow[]>([{ kind: 'ballast', timeS: 0 }]);
  const setRow = (index: number, change: Partial<ReadingRow>) =>
    setRows((current) => current.map((row, i) => (i === index ? { ...row, ...change } : row)));

  const readings = rows.map(toReading);
  const complete =
    temperatureK !== undefined &&
    pressurePa !== undefined &&
    filledAt !== '' &&
    readings.every((reading) => reading !== undefined);

  const submit = () => {
    if (!complete) return;
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
      okButtonProps={{ disabled: !complete, loading: create.isPending }}
      onOk={submit}
      destroyOnHidden
    >
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
        <Space wrap align="start">
          <Form.Item label="Air temperature" htmlFor={`${idPrefix}-t`}>
            <QuantityInput
              id={`${idPrefix}-t`}
              label="Air temperature"
              dimension="temperature"
              value={temperatureK}
              onChange={setTemperatureK}
              unitSystem={unitSystem}
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
            />
          </Form.Item>
        </Space>
        <Typography.Title level={5}>Lift readings</Typography.Title>
        <Typography.Paragraph type="secondary">
          Tie the envelope to a known ballast standing on a scale: the net lift is the ballast less
          what the scale shows. Or enter a net lift read directly from a spring balance or load
          cell.
        </Typography.Paragraph>
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
                  />
                </Form.Item>
                <Form.Item label="Scale reading">
                  <QuantityInput
                    label={`Reading ${index + 1} scale reading`}
                    dimension="mass"
                    value={row.scaleReadingKg}
                    onChange={(scaleReadingKg) => setRow(index, { scaleReadingKg })}
                    unitSystem={unitSystem}
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
        <FormError error={create.error} />
      </Form>
    </Modal>
  );
}
