import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Form } from 'antd';
import { KINDS } from '@loftwright/buoyancy';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '@/testing/test-utils';
import { SchemaField } from './schema-form';

const liftCheckSchema = KINDS.find((kind) => kind.id === 'lift-check')?.inputSchema ?? {};
const gasSchema = (liftCheckSchema.properties as Record<string, Record<string, unknown>>).gas ?? {};

function Harness({ initial }: { initial: Record<string, unknown> }) {
  const [value, setValue] = useState<unknown>(initial);
  return (
    <Form layout="vertical" component="div">
      <SchemaField
        name="gas"
        path="gas"
        schema={gasSchema}
        value={value}
        onChange={setValue}
        unitSystem="si"
        errors={{}}
      />
      <output aria-label="Reported gas">{JSON.stringify(value)}</output>
    </Form>
  );
}

describe('fields the engine says mean nothing', () => {
  it('hides purity and gas humidity for heated air, and drops a purity typed before', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Harness initial={{ gasId: 'helium', purity: 0.98, superheatK: 0 }} />);
    expect(screen.getByLabelText(/^Mole fraction of the named gas/)).toBeInTheDocument();

    await user.click(screen.getByRole('combobox', { name: /lifting gas/i }));
    await user.click(await screen.findByTitle('Heated air'));
    expect(screen.queryByLabelText(/^Mole fraction of the named gas/)).not.toBeInTheDocument();
    expect(screen.queryByLabelText(/^Water vapour in the gas/)).not.toBeInTheDocument();
    // The heated air is the air itself: no purity is kept to be refused.
    expect(JSON.parse(screen.getByLabelText('Reported gas').textContent ?? '{}')).toEqual({
      gasId: 'hot-air',
      superheatK: 0,
    });
    expect(screen.getByLabelText(/^Gas temperature above the air temperature/)).toBeInTheDocument();
  });
});
