import { Alert, Button, Form, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { type ContextType, type ReactNode, useState } from 'react';
import { UnreadableFieldsContext } from '@/components/reading/unreadable-fields';
import { takesWindProfile, WindImportButton } from '../wind/wind-import-button';
import { MeterImport } from './meter-import';
import { SchemaField } from './schema-form';

/** Something composed in by the route that fills inputs for the person (a library envelope). */
export type InputsPicker = (value: unknown, onChange: (value: unknown) => void) => ReactNode;

const checkBeforeSaving = (count: number) =>
  `Check before saving: ${count === 1 ? 'one value lies' : `${count} values lie`} outside what is usually met.`;

/**
 * The inputs of a calculation as a form built from the kind's schema, with the engine's notes,
 * the import of a meter log where the kind takes one, and the saving controls (`children`) for
 * those who may edit.
 */
export function CalculationInputsSection({
  schema,
  value,
  onChange,
  unitSystem,
  errors,
  notes,
  editable,
  dirty,
  unreadableRegistry,
  onMeteredEnergy,
  picker,
  children,
}: {
  schema: Record<string, unknown>;
  value: unknown;
  onChange: (value: unknown) => void;
  unitSystem: UnitSystem;
  errors: Record<string, string>;
  notes: Record<string, string>;
  editable: boolean;
  dirty: boolean;
  unreadableRegistry: ContextType<typeof UnreadableFieldsContext>;
  /** Takes an energy from a meter log; absent when the kind takes none or the reader may not edit. */
  onMeteredEnergy?: (energyJ: number) => void;
  /** Fills inputs from elsewhere; shown only to those who may edit, values stay in the form. */
  picker?: InputsPicker;
  children: ReactNode;
}) {
  const [meterOpen, setMeterOpen] = useState(false);
  const noteCount = Object.keys(notes).length;
  return (
    <section aria-label="Inputs">
      <Typography.Title level={4}>Inputs</Typography.Title>
      {editable && picker ? picker(value, onChange) : null}
      <Form layout="vertical" component="div" requiredMark={false}>
        <UnreadableFieldsContext.Provider value={unreadableRegistry}>
          <SchemaField
            name=""
            path=""
            schema={schema}
            value={value}
            onChange={onChange}
            unitSystem={unitSystem}
            errors={errors}
            notes={notes}
            disabled={!editable}
          />
        </UnreadableFieldsContext.Provider>
      </Form>
      {editable && takesWindProfile(schema) ? (
        <WindImportButton value={value} onChange={onChange} unitSystem={unitSystem} />
      ) : null}
      {onMeteredEnergy ? (
        <Button style={{ marginBottom: 12 }} onClick={() => setMeterOpen(true)}>
          Energy from a meter log (CSV)
        </Button>
      ) : null}
      {editable && dirty && noteCount > 0 ? (
        <Alert
          type="warning"
          showIcon
          role="status"
          title={checkBeforeSaving(noteCount)}
          description="They are kept as typed, and the notes are recorded with the version."
          style={{ marginBottom: 8 }}
        />
      ) : null}
      {editable ? (
        children
      ) : (
        <Alert
          type="info"
          showIcon
          title="You can read this calculation; only its owner saves versions."
        />
      )}
      {meterOpen ? (
        <MeterImport
          open={meterOpen}
          unitSystem={unitSystem}
          onClose={() => setMeterOpen(false)}
          onUse={(energyJ) => {
            setMeterOpen(false);
            onMeteredEnergy?.(energyJ);
          }}
        />
      ) : null}
    </section>
  );
}
