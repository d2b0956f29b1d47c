import { Alert, Button, Form, Input, Radio, Space } from 'antd';
import { formatRange, LIBRARY_ENVELOPE_RANGES, type UnitSystem } from '@loftwright/buoyancy';
import { useId } from 'react';
import { FieldFormError } from '@/components/errors/field-form-error';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import {
  describeUnreadable,
  type UnreadableField,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import type { Envelope, EnvelopeBody } from '../api/envelopes-api';
import {
  envelopeBodyOf,
  type EnvelopeFields,
  useEnvelopeFields,
} from '../hooks/use-envelope-fields';
import { ENVELOPE_FIELDS, envelopeLabel, KIND_WORDS } from './envelope-field-labels';

const label = (field: string) => ENVELOPE_FIELDS[field]?.label ?? field;

type RangedField = keyof typeof LIBRARY_ENVELOPE_RANGES;

/** Figures that read but lie outside what the library keeps (the server's own ranges). */
function useOutOfRange(fields: EnvelopeFields, unitSystem: UnitSystem): UnreadableField[] {
  const { numberFormat } = useReadingPreferences();
  const shown: Record<RangedField, number | undefined> = {
    massKg: fields.massKg,
    burstDiameterM: fields.kind === 'extensible' ? fields.burstDiameterM : undefined,
    ratedSuperpressurePa: fields.kind === 'fixed' ? fields.ratedSuperpressurePa : undefined,
    dragCoefficient: fields.dragCoefficient,
  };
  return (Object.keys(shown) as RangedField[]).flatMap((field) => {
    const value = shown[field];
    const { min, max } = LIBRARY_ENVELOPE_RANGES[field];
    const dimension = ENVELOPE_FIELDS[field]?.dimension;
    if (value === undefined || (value >= min && value <= max) || !dimension) return [];
    if (dimension === 'count' || dimension === 'money') return [];
    const range = formatRange(min, max, dimension, { unitSystem, numberFormat });
    return [{ label: label(field), reason: `must be ${range}` }];
  });
}

/**
 * Adds an envelope to the library or changes one: its figures typed with units (stored in SI),
 * the film and notes as text. Saving waits for every field to read.
 */
export function EnvelopeForm({
  envelope,
  unitSystem,
  saving,
  error,
  onSubmit,
  onCancel,
}: {
  /** The envelope being changed; a new one when absent. */
  envelope?: Envelope;
  unitSystem: UnitSystem;
  saving: boolean;
  error: Error | null;
  onSubmit: (body: EnvelopeBody) => void;
  onCancel?: () => void;
}) {
  const id = useId();
  const fields = useEnvelopeFields(envelope);
  const [unreadableFields, registry] = useUnreadableFields();
  const outOfRange = useOutOfRange(fields, unitSystem);
  const unreadable = [...unreadableFields, ...outOfRange];
  const body = envelopeBodyOf(fields);
  const ranges = LIBRARY_ENVELOPE_RANGES;
  return (
    <UnreadableFieldsContext.Provider value={registry}>
      <Form layout="vertical" component="div" requiredMark={false} style={{ maxWidth: 560 }}>
        <Form.Item label={label('name')} htmlFor={`${id}-name`}>
          <Input
            id={`${id}-name`}
            value={fields.name}
            maxLength={120}
            onChange={(event) => fields.setName(event.target.value)}
          />
        </Form.Item>
        <Form.Item label={label('kind')}>
          <Radio.Group
            aria-label={label('kind')}
            value={fields.kind}
            onChange={(event) => fields.setKind(event.target.value as Envelope['kind'])}
            options={(['extensible', 'fixed'] as const).map((kind) => ({
              value: kind,
              label: KIND_WORDS[kind],
            }))}
          />
        </Form.Item>
        <Form.Item label={label('massKg')} htmlFor={`${id}-mass`}>
          <QuantityInput
            id={`${id}-mass`}
            label={label('massKg')}
            dimension="mass"
            value={fields.massKg}
            onChange={fields.setMassKg}
            range={ranges.massKg}
            unitSystem={unitSystem}
          />
        </Form.Item>
        {fields.kind === 'extensible' ? (
          <Form.Item label={label('burstDiameterM')} htmlFor={`${id}-burst`}>
            <QuantityInput
              id={`${id}-burst`}
              label={label('burstDiameterM')}
              dimension="length"
              value={fields.burstDiameterM}
              onChange={fields.setBurstDiameterM}
              range={ranges.burstDiameterM}
              unitSystem={unitSystem}
            />
          </Form.Item>
        ) : (
          <Form.Item label={label('ratedSuperpressurePa')} htmlFor={`${id}-superpressure`}>
            <QuantityInput
              id={`${id}-superpressure`}
              label={label('ratedSuperpressurePa')}
              dimension="pressureDifference"
              value={fields.ratedSuperpressurePa}
              onChange={fields.setRatedSuperpressurePa}
              range={ranges.ratedSuperpressurePa}
              unitSystem={unitSystem}
            />
          </Form.Item>
        )}
        <Form.Item
          label={`${label('dragCoefficient')} (optional)`}
          htmlFor={`${id}-drag`}
          extra="Left empty, a calculation keeps its own."
        >
          <QuantityInput
            id={`${id}-drag`}
            label={label('dragCoefficient')}
            dimension="coefficient"
            value={fields.dragCoefficient}
            onChange={fields.setDragCoefficient}
            range={ranges.dragCoefficient}
            unitSystem={unitSystem}
          />
        </Form.Item>
        <Form.Item label={label('film')} htmlFor={`${id}-film`}>
          <Input
            id={`${id}-film`}
            placeholder="natural latex, metallised film…"
            value={fields.film}
            maxLength={120}
            onChange={(event) => fields.setFilm(event.target.value)}
          />
        </Form.Item>
        <Form.Item label={label('notes')} htmlFor={`${id}-notes`}>
          <Input.TextArea
            id={`${id}-notes`}
            rows={3}
            maxLength={4000}
            value={fields.notes}
            onChange={(event) => fields.setNotes(event.target.value)}
          />
        </Form.Item>
        {unreadable.length > 0 ? (
          <Alert
            type="error"
            showIcon
            title={`Not saved until these are put right: ${describeUnreadable(unreadable)}`}
            style={{ marginBottom: 12 }}
          />
        ) : null}
        <FieldFormError error={error} labels={envelopeLabel} unitSystem={unitSystem} />
        <Space>
          <Button
            type="primary"
            loading={saving}
            disabled={!body || unreadable.length > 0}
            onClick={() => body && onSubmit(body)}
          >
            {envelope ? 'Save changes' : 'Add to the library'}
          </Button>
          {onCancel ? <Button onClick={onCancel}>Cancel</Button> : null}
        </Space>
      </Form>
    </UnreadableFieldsContext.Provider>
  );
}
