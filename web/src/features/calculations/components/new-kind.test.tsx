import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Form } from 'antd';
import {
  defineKind,
  Derivation,
  describeKind,
  evaluateKind,
  InputError,
  quantity,
} from '@loftwright/buoyancy';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import * as z from 'zod';
import { ResultsPanel } from '@/components/results/results-panel';
import { renderWithProviders } from '@/testing/test-utils';
import { SchemaField } from './schema-form';

/**
 * A kind the web has never heard of, made only of what DEVELOPERS.md's "Add a calculation kind"
 * lists: a schema of quantities, a derivation, and (here) no capabilities. It is a fixture, not
 * a product kind: a box's volume is length × width × height by definition.
 */
const boxVolumeKind = defineKind({
  id: 'box-volume',
  title: 'Box volume',
  description: 'The volume of a rectangular box.',
  schema: z
    .object({
      box: z
        .object({
          lengthM: quantity('length', 0.01, 100, 'inside length of the box'),
          widthM: quantity('length', 0.01, 100, 'inside width of the box'),
          heightM: quantity('length', 0.01, 100, 'inside height of the box'),
        })
        .strict(),
    })
    .strict(),
  example: { box: { lengthM: 2, widthM: 3, heightM: 4 } },
  compute({ box }) {
    const d = new Derivation();
    d.step({
      id: 'volume',
      label: 'Volume of the box',
      formula: 'V = l·w·h',
      values: [
        { symbol: 'l', value: box.lengthM, unit: 'm' },
        { symbol: 'w', value: box.widthM, unit: 'm' },
        { symbol: 'h', value: box.heightM, unit: 'm' },
      ],
      result: { symbol: 'V', value: box.lengthM * box.widthM * box.heightM, unit: 'm³' },
      source: 'volume of a rectangular box, by definition',
    });
    d.output('volumeM3', 'Volume', 'volume');
    return d.result();
  },
});

const description = describeKind(boxVolumeKind);

/** The editor's two halves as the calculation page composes them, for any kind. */
function Workbench() {
  const [inputs, setInputs] = useState<unknown>(description.example);
  let result;
  let problem: string | undefined;
  try {
    result = evaluateKind(boxVolumeKind, inputs);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    problem = error.message;
  }
  return (
    <>
      <Form layout="vertical" component="div">
        <SchemaField
          name=""
          path=""
          schema={description.inputSchema}
          value={inputs}
          onChange={setInputs}
          unitSystem="us"
          errors={{}}
        />
      </Form>
      <ResultsPanel result={result} unitSystem="us" problem={problem} />
    </>
  );
}

describe('a calculation kind added to the engine alone', () => {
  it('gets a form with its labels and units and live results, with no web code of its own', async () => {
    const user = userEvent.setup();
    renderWithProviders(<Workbench />);

    // Labels come from the schema's descriptions, units from its dimension (US customary here).
    const length = screen.getByLabelText(/^Inside length of the box/i);
    expect(screen.getByLabelText(/^Inside width of the box/i)).toBeInTheDocument();
    expect(screen.getByLabelText(/^Inside height of the box/i)).toBeInTheDocument();
    const results = screen.getByRole('status', { name: 'Results' });
    // 2 m × 3 m × 4 m = 24 m³ = 847.55 ft³ (1 ft = 0.3048 m exactly, NIST SP 811 B.8).
    expect(within(results).getByText('Volume')).toBeInTheDocument();
    expect(results.textContent).toMatch(/847\.\d/);
    expect(results.textContent).toMatch(/ft³/);

    // Typing a new length recomputes through the kind's own rule.
    await user.clear(length);
    await user.type(length, '10 ft');
    await user.tab();
    // 3.048 m × 3 m × 4 m = 36.576 m³ = 1291.7 ft³, shown to four significant digits.
    expect(results.textContent).toMatch(/1[,\s]?292 ft³/);
  });

  it('states no capabilities, so the web offers none of the extras', () => {
    expect(description.capabilities).toEqual({
      charts: [],
      predictsFillLift: false,
      meterImport: false,
      landingArea: false,
    });
  });
});
