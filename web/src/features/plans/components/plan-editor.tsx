import {
  Alert,
  Button,
  Card,
  Col,
  Form,
  Input,
  Row,
  Select,
  Space,
  Switch,
  Table,
  Typography,
} from 'antd';
import type { InputFieldInfo, UnitSystem } from '@loftwright/buoyancy';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { useId, useState } from 'react';
import { SupplyCostChart } from '@/components/charts/supply-cost-chart';
import { ExportButton } from '@/components/export/export-button';
import { FieldFormError } from '@/components/errors/field-form-error';
import { CountInput } from '@/components/quantity/count-input';
import { MoneyInput } from '@/components/quantity/money-input';
import {
  describeUnreadable,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import { CURRENCIES } from '@/config/currencies';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { ResultsPanel } from '@/components/results/results-panel';
import {
  type Plan,
  type PlanDraft,
  type PlanLineResult,
  useCalculationOptions,
  useSavePlan,
} from '../api/plans-api';

const ENTERED = 'entered';
const SPHERE = 'sphere';
const DEFAULT_ELECTROLYSER: NonNullable<PlanDraft['electrolyser']> = {
  currentA: 30,
  cellsInSeries: 6,
  faradaicEfficiency: 0.95,
  voltage: { kind: 'cell', cellVoltageV: 2.1 },
  supplyEfficiency: 0.88,
};
const DEFAULT_CYLINDER: NonNullable<PlanDraft['cylinder']> = {
  gasId: 'helium',
  waterVolumeM3: 0.05,
  fillPressurePa: 2e7,
  temperatureK: 288.15,
};

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
function planLabel(field: string): InputFieldInfo | undefined {
  const line = /^lines\.(\d+)(?:\.(\w+))?$/.exec(field);
  if (line) {
    const envelope = `Envelope ${Number(line[1]) + 1}`;
    const info = line[2] ? PLAN_FIELDS[line[2]] : undefined;
    return info ? { ...info, label: `${envelope} ${info.label}` } : { label: envelope };
  }
  return PLAN_FIELDS[field];
}

/**
 * A gas plan: the envelopes of an event times their counts, the air at filling, the supply and
 * its prices; saved to the server, which computes the totals, running time and cost per source.
 */
export function PlanEditor({ plan, unitSystem }: { plan: Plan; unitSystem: UnitSystem }) {
  const id = useId();
  const save = useSavePlan(plan.id);
  const options = useCalculationOptions();
  const [draft, setDraft] = useState<PlanDraft>(plan.inputs);
  const set = (change: Partial<PlanDraft>) => setDraft((current) => ({ ...current, ...change }));
  const setLine = (index: number, change: Partial<PlanDraft['lines'][number]>) =>
    set({
      lines: draft.lines.map((line, i) => (i === index ? { ...line, ...change } : line)),
    });
  const result = save.data?.result ?? plan.result;
  // Fields whose text does not read as a quantity: saving waits until they do, so a value the
  // user can see is wrong is never saved as the last one that read.
  const [unreadable, setUnreadable] = useState<ReadonlySet<string>>(new Set());
  const forget = (...keys: string[]) =>
    setUnreadable(
      (current) => new Set([...current].filter((key) => !keys.some((k) => key.startsWith(k)))),
    );
  const readAs = (key: string, value: number | undefined, apply: (value: number) => void) => {
    setUnreadable((current) => {
      const next = new Set(current);
      if (value === undefined) next.add(key);
      else next.delete(key);
      return next;
    });
    if (value !== undefined) apply(value);
  };
  const [unreadableFields, unreadableRegistry] = useUnreadableFields();
  const currency = draft.prices?.currency ?? '';
  const savedCurrency = (save.data ?? plan).inputs.prices?.currency ?? '';
  const display = useNumberDisplay(unitSystem);
  const volume = (m3: number) => display.quantity(m3, 'volume').text;

  return (
    <Row gutter={[16, 16]}>
      <Col xs={24} xl={12}>
        <UnreadableFieldsContext.Provider value={unreadableRegistry}>
          <Form layout="vertical" component="div" requiredMark={false}>
            <Space wrap>
              <Form.Item label="Plan" htmlFor={`${id}-title`}>
                <Input
                  id={`${id}-title`}
                  value={draft.title}
                  maxLength={200}
                  style={{ width: 280 }}
                  onChange={(event) => set({ title: event.target.value })}
                />
              </Form.Item>
              <Form.Item label="Event date" htmlFor={`${id}-date`}>
                <Input
                  id={`${id}-date`}
                  type="date"
                  value={draft.eventDate ?? ''}
                  onChange={(event) => set({ eventDate: event.target.value || undefined })}
                />
              </Form.Item>
            </Space>

            <Typography.Title level={5}>Envelopes</Typography.Title>
            {draft.lines.map((line, index) => (
              <Space
                key={index}
                wrap
                align="start"
                role="group"
                aria-label={`Envelope ${index + 1}`}
              >
                <Form.Item label="From">
                  <Select
                    aria-label={`Envelope ${index + 1} from`}
                    style={{ width: 260 }}
                    loading={options.isPending}
                    value={line.calculationId ?? (line.diameterM === undefined ? ENTERED : SPHERE)}
                    options={[
                      { value: ENTERED, label: 'A volume I enter' },
                      { value: SPHERE, label: 'A sphere of a diameter I enter' },
                      ...(options.data ?? []).map((option) => ({
                        value: option.id,
                        label: `${option.title} (v${option.latestVersion})`,
                      })),
                    ]}
                    onChange={(value: string) => {
                      forget(`lines.${index}.`);
                      setLine(
                        index,
                        value === ENTERED
                          ? {
                              calculationId: undefined,
                              diameterM: undefined,
                              volumeM3: line.volumeM3 ?? 1,
                            }
                          : value === SPHERE
                            ? {
                                calculationId: undefined,
                                volumeM3: undefined,
                                diameterM: line.diameterM ?? 1,
                              }
                            : { calculationId: value, volumeM3: undefined, diameterM: undefined },
                      );
                    }}
                  />
                </Form.Item>
                {line.diameterM !== undefined ? (
                  <Form.Item label="Diameter">
                    <QuantityInput
                      label={`Envelope ${index + 1} diameter`}
                      dimension="length"
                      value={line.diameterM}
                      onChange={(diameterM) =>
                        readAs(`lines.${index}.diameterM`, diameterM, (value) =>
                          setLine(index, { diameterM: value }),
                        )
                      }
                      unitSystem={unitSystem}
                    />
                  </Form.Item>
                ) : null}
                {line.calculationId || line.diameterM !== undefined ? null : (
                  <Form.Item label="Gas per envelope">
                    <QuantityInput
                      label={`Envelope ${index + 1} gas per envelope`}
                      dimension="volume"
                      value={line.volumeM3}
                      onChange={(volumeM3) =>
                        readAs(`lines.${index}.volumeM3`, volumeM3, (value) =>
                          setLine(index, { volumeM3: value }),
                        )
                      }
                      unitSystem={unitSystem}
                    />
                  </Form.Item>
                )}
                <Form.Item label="How many">
                  <CountInput
                    label={`Envelope ${index + 1} count`}
                    min={1}
                    max={100000}
                    value={line.count}
                    onChange={(count) => count !== undefined && setLine(index, { count })}
                  />
                </Form.Item>
                <Form.Item label="Name (optional)">
                  <Input
                    aria-label={`Envelope ${index + 1} name`}
                    value={line.label ?? ''}
                    maxLength={200}
                    onChange={(event) => setLine(index, { label: event.target.value || undefined })}
                  />
                </Form.Item>
              </Space>
            ))}
            <Space style={{ marginBottom: 16 }}>
              <Button onClick={() => set({ lines: [...draft.lines, { volumeM3: 1, count: 1 }] })}>
                Add an envelope
              </Button>
              {draft.lines.length > 1 ? (
                <Button
                  onClick={() => {
                    forget(`lines.${draft.lines.length - 1}.`);
                    set({ lines: draft.lines.slice(0, -1) });
                  }}
                >
                  Remove the last envelope
                </Button>
              ) : null}
            </Space>

            <Typography.Title level={5}>Gas at filling</Typography.Title>
            <Space wrap align="start">
              <Form.Item label="Gas temperature">
                <QuantityInput
                  label="Gas temperature at filling"
                  dimension="temperature"
                  value={draft.fill.temperatureK}
                  onChange={(temperatureK) =>
                    readAs('temperatureK', temperatureK, (temperatureK) =>
                      set({ fill: { ...draft.fill, temperatureK } }),
                    )
                  }
                  unitSystem={unitSystem}
                />
              </Form.Item>
              <Form.Item label="Gas pressure (absolute)">
                <QuantityInput
                  label="Gas pressure at filling"
                  dimension="pressure"
                  value={draft.fill.pressurePa}
                  onChange={(pressurePa) =>
                    readAs('pressurePa', pressurePa, (pressurePa) =>
                      set({ fill: { ...draft.fill, pressurePa } }),
                    )
                  }
                  unitSystem={unitSystem}
                />
              </Form.Item>
            </Space>

            <Typography.Title level={5}>Sources</Typography.Title>
            <Space align="center" style={{ marginBottom: 8 }}>
              <Switch
                aria-label="Own electrolyser"
                checked={draft.electrolyser !== undefined}
                onChange={(on) => {
                  forget('currentA', 'cellVoltageV');
                  set({ electrolyser: on ? DEFAULT_ELECTROLYSER : undefined });
                }}
              />
              <Typography.Text>Own electrolyser (hydrogen)</Typography.Text>
            </Space>
            {draft.electrolyser ? (
              <Space wrap align="start">
                <Form.Item label="Current">
                  <QuantityInput
                    label="Electrolyser current"
                    dimension="current"
                    value={draft.electrolyser.currentA}
                    onChange={(currentA) =>
                      readAs(
                        'currentA',
                        currentA,
                        (currentA) =>
                          draft.electrolyser &&
                          set({ electrolyser: { ...draft.electrolyser, currentA } }),
                      )
                    }
                    unitSystem={unitSystem}
                  />
                </Form.Item>
                <Form.Item label="Cells in series">
                  <CountInput
                    label="Cells in series"
                    min={1}
                    max={1000}
                    value={draft.electrolyser.cellsInSeries}
                    onChange={(cellsInSeries) =>
                      draft.electrolyser &&
                      cellsInSeries !== undefined &&
                      set({ electrolyser: { ...draft.electrolyser, cellsInSeries } })
                    }
                  />
                </Form.Item>
                <Form.Item label="Voltage per cell">
                  <QuantityInput
                    label="Voltage per cell"
                    dimension="voltage"
                    value={draft.electrolyser.voltage.cellVoltageV}
                    onChange={(cellVoltageV) =>
                      readAs(
                        'cellVoltageV',
                        cellVoltageV,
                        (cellVoltageV) =>
                          draft.electrolyser &&
                          set({
                            electrolyser: {
                              ...draft.electrolyser,
                              voltage: { kind: 'cell', cellVoltageV },
                            },
                          }),
                      )
                    }
                    unitSystem={unitSystem}
                  />
                </Form.Item>
              </Space>
            ) : null}
            <Space align="center" style={{ margin: '8px 0' }}>
              <Switch
                aria-label="Gas cylinders"
                checked={draft.cylinder !== undefined}
                onChange={(on) => {
                  forget('waterVolumeM3', 'fillPressurePa');
                  set({ cylinder: on ? DEFAULT_CYLINDER : undefined });
                }}
              />
              <Typography.Text>Gas cylinders</Typography.Text>
            </Space>
            {draft.cylinder ? (
              <Space wrap align="start">
                <Form.Item label="Gas">
                  <Select
                    aria-label="Cylinder gas"
                    style={{ width: 140 }}
                    value={draft.cylinder.gasId}
                    options={[
                      { value: 'helium', label: 'Helium' },
                      { value: 'hydrogen', label: 'Hydrogen' },
                    ]}
                    onChange={(gasId: string) =>
                      draft.cylinder && set({ cylinder: { ...draft.cylinder, gasId } })
                    }
                  />
                </Form.Item>
                <Form.Item label="Water volume of one cylinder">
                  <QuantityInput
                    label="Cylinder water volume"
                    dimension="volume"
                    value={draft.cylinder.waterVolumeM3}
                    onChange={(waterVolumeM3) =>
                      readAs(
                        'waterVolumeM3',
                        waterVolumeM3,
                        (waterVolumeM3) =>
                          draft.cylinder && set({ cylinder: { ...draft.cylinder, waterVolumeM3 } }),
                      )
                    }
                    unitSystem={unitSystem}
                  />
                </Form.Item>
                <Form.Item label="Fill pressure (gauge)">
                  <QuantityInput
                    label="Cylinder fill pressure"
                    dimension="pressureDifference"
                    value={draft.cylinder.fillPressurePa}
                    onChange={(fillPressurePa) =>
                      readAs(
                        'fillPressurePa',
                        fillPressurePa,
                        (fillPressurePa) =>
                          draft.cylinder &&
                          set({ cylinder: { ...draft.cylinder, fillPressurePa } }),
                      )
                    }
                    unitSystem={unitSystem}
                  />
                </Form.Item>
              </Space>
            ) : null}

            <Typography.Title level={5}>Prices</Typography.Title>
            <Space wrap align="start">
              <Form.Item label="Currency" htmlFor={`${id}-currency`}>
                <Select
                  id={`${id}-currency`}
                  value={currency || undefined}
                  style={{ width: 110 }}
                  options={(CURRENCIES.includes(currency) || !currency
                    ? CURRENCIES
                    : [currency, ...CURRENCIES]
                  ).map((code) => ({ value: code, label: code }))}
                  onChange={(code: string) => set({ prices: { ...draft.prices, currency: code } })}
                />
              </Form.Item>
              <Form.Item label="Quoted on" htmlFor={`${id}-prices-date`}>
                <Input
                  id={`${id}-prices-date`}
                  type="date"
                  value={draft.pricesDate ?? ''}
                  onChange={(event) => set({ pricesDate: event.target.value || undefined })}
                />
              </Form.Item>
              {(
                [
                  ['electricityPerKWh', 'Electricity price', 'kWh', 100],
                  ['cylinderEach', 'One full cylinder', undefined, 1e6],
                  ['bulkGasPerM3', 'Delivered gas, per normal m³', 'm³', 1e5],
                ] as const
              ).map(([key, label, per, max]) => (
                <Form.Item key={key} label={`${label} (${currency}${per ? `/${per}` : ''})`}>
                  <MoneyInput
                    label={label}
                    currency={currency}
                    per={per}
                    max={max}
                    value={draft.prices?.[key]}
                    onChange={(value) =>
                      set({ prices: { currency, ...draft.prices, [key]: value } })
                    }
                  />
                </Form.Item>
              ))}
            </Space>
            <FieldFormError error={save.error} unitSystem={unitSystem} labels={planLabel} />
            {unreadable.size > 0 || unreadableFields.length > 0 ? (
              <Alert
                type="warning"
                showIcon
                title={`Not saved until these read: ${
                  describeUnreadable(unreadableFields) || 'a quantity field above'
                }`}
                style={{ marginBottom: 8 }}
              />
            ) : null}
            <Button
              type="primary"
              loading={save.isPending}
              disabled={unreadable.size > 0 || unreadableFields.length > 0}
              onClick={() => save.mutate(draft)}
            >
              Save and compute
            </Button>
          </Form>
        </UnreadableFieldsContext.Provider>
      </Col>
      <Col xs={24} xl={12}>
        <Card
          title="Gas for the plan"
          size="small"
          extra={<ExportButton path={`/plans/${plan.id}/export`} what="the plan lines" />}
        >
          <Table<PlanLineResult>
            size="small"
            rowKey={(line) => `${line.label}-${line.calculationId ?? ''}-${line.count}`}
            aria-label="Plan lines"
            pagination={false}
            dataSource={result.lines}
            columns={[
              { title: 'Envelope', dataIndex: 'label' },
              { title: 'Gas each', dataIndex: 'volumeM3', render: volume },
              { title: 'Count', dataIndex: 'count', render: (n: number) => display.number(n) },
              { title: 'Gas in all', dataIndex: 'totalM3', render: volume },
            ]}
            summary={() => (
              <Table.Summary.Row>
                <Table.Summary.Cell index={0} colSpan={3}>
                  <Typography.Text strong>Total, at filling conditions</Typography.Text>
                </Table.Summary.Cell>
                <Table.Summary.Cell index={1}>
                  <Typography.Text strong data-total>
                    {volume(result.totalM3)}
                  </Typography.Text>
                </Table.Summary.Cell>
              </Table.Summary.Row>
            )}
          />
        </Card>
        {save.isSuccess ? (
          <Alert
            type="success"
            showIcon
            title="Saved; the figures below are the server's."
            style={{ marginTop: 12 }}
          />
        ) : null}
        <SupplyCostChart
          result={{ outputs: result.outputs, steps: result.steps, warnings: result.warnings }}
          inputs={{ fill: { count: 1 }, prices: { currency: savedCurrency } }}
          title="Cost of the plan by source"
          axisLabel="Cost"
        />
        <div style={{ marginTop: 16 }}>
          <ResultsPanel
            result={{ outputs: result.outputs, steps: result.steps, warnings: result.warnings }}
            unitSystem={unitSystem}
            title="Supply for the whole plan"
          />
        </div>
      </Col>
    </Row>
  );
}
