import { App, Button } from 'antd';
import type { UnitSystem, WindLayerValues } from '@loftwright/buoyancy';
import { useState } from 'react';
import { WindImport } from './wind-import';

/** Whether a kind's inputs take a wind profile (`wind.layers`), read from its schema. */
export function takesWindProfile(schema: Record<string, unknown>): boolean {
  const properties = schema.properties as Record<string, { properties?: object }> | undefined;
  return Boolean(properties?.wind?.properties && 'layers' in properties.wind.properties);
}

/** The inputs with these wind levels in place of any typed before; everything else kept. */
export function withWindLayers(inputs: unknown, layers: readonly WindLayerValues[]): unknown {
  return { ...((inputs ?? {}) as Record<string, unknown>), wind: { layers: [...layers] } };
}

/**
 * Opens the wind file import; the levels chosen go into the form's wind, where they can be
 * checked and edited, and are saved only with the next version.
 */
export function WindImportButton({
  value,
  onChange,
  unitSystem,
}: {
  value: unknown;
  onChange: (value: unknown) => void;
  unitSystem: UnitSystem;
}) {
  const { message } = App.useApp();
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button style={{ marginBottom: 12, marginRight: 8 }} onClick={() => setOpen(true)}>
        Winds from a file (CSV or text)
      </Button>
      {open ? (
        <WindImport
          open
          unitSystem={unitSystem}
          onClose={() => setOpen(false)}
          onUse={(layers) => {
            setOpen(false);
            onChange(withWindLayers(value, layers));
            void message.info(
              `${layers.length} wind levels entered under the winds aloft: check them, then save a version.`,
            );
          }}
        />
      ) : null}
    </>
  );
}
