import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { Form } from 'antd';
import { evaluate, KINDS, normaliseInputs } from '@loftwright/buoyancy';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { renderInRouter, renderWithProviders } from '@/testing/test-utils';
import type { CalculationDetail } from '../api/calculations-api';
import { EditorBody } from './calculation-editor';
import { SchemaField } from './schema-form';

const balloonRulesSchema = KINDS.find((kind) => kind.id === 'balloon-rules')?.inputSchema ?? {};

/** The form as the editor holds it: the value the fields report, shown as JSON. */
function Harness({ schema, initial }: { schema: Record<string, unknown>; initial: unknown }) {
  const [value, setValue] = useState(initial);
  return (
    <Form layout="vertical" component="div">
      <SchemaField
        name=""
        path=""
        schema={schema}
        value={value}
        onChange={setValue}
        unitSystem="si"
        errors={{}}
      />
      <output aria-label="Reported inputs">{JSON.stringify(value)}</output>
    </Form>
  );
}

const reported = () =>
  JSON.parse(screen.getByLabelText('Reported inputs').textContent ?? 'null') as {
    packages?: unknown[];
  };
const row = (name: string) => screen.getByRole('group', { name });
const massIn = (group: HTMLElement) => within(group).getByLabelText(/^mass of the package/i);
const areaIn = (group: HTMLElement) =>
  within(group).getByLabelText(/^area of its smallest surface/i);

describe('a list of objects in a calculation form', () => {
  it('adds, fills and removes packages as rows, and reports the list', () => {
    renderWithProviders(
      <Harness
        schema={balloonRulesSchema}
        initial={{ profileId: 'us-14cfr101', operation: 'free', packages: [{ massKg: 1.2 }] }}
      />,
    );
    expect(screen.queryByText('A list, written as JSON')).not.toBeInTheDocument();
    expect(screen.getByRole('group', { name: 'Payload packages' })).toBeInTheDocument();
    expect(massIn(row('Package 1'))).toHaveValue('1.2 kg');

    fireEvent.click(screen.getByRole('button', { name: 'Add package' }));
    // A new package starts from the item schema's defaults: none, so an empty object.
    expect(reported().packages).toEqual([{ massKg: 1.2 }, {}]);
    fireEvent.change(massIn(row('Package 2')), { target: { value: '3 kg' } });
    fireEvent.change(areaIn(row('Package 2')), { target: { value: '500 cm²' } });
    // 500 cm² = 0.05 m² (SI prefix definition).
    expect(reported().packages).toEqual([
      { massKg: 1.2 },
      { massKg: 3, smallestSurfaceAreaM2: 0.05 },
    ]);

    fireEvent.click(screen.getByRole('button', { name: 'Remove package 1' }));
    expect(reported().packages).toEqual([{ massKg: 3, smallestSurfaceAreaM2: 0.05 }]);
    // The row that stays keeps its own typing, now numbered 1.
    expect(screen.queryByRole('group', { name: 'Package 2' })).not.toBeInTheDocument();
    expect(massIn(row('Package 1'))).toHaveValue('3 kg');
    expect(areaIn(row('Package 1'))).toHaveValue('500 cm²');

    fireEvent.click(screen.getByRole('button', { name: 'Remove package 1' }));
    expect(reported().packages).toEqual([]);
    expect(screen.getByText('No packages yet.')).toBeInTheDocument();
  });

  it('titles the jurisdiction and the operation for people', () => {
    renderWithProviders(
      <Harness
        schema={balloonRulesSchema}
        initial={{ profileId: 'us-14cfr101', operation: 'moored', packages: [] }}
      />,
    );
    const jurisdiction = screen.getByRole('combobox', { name: /jurisdiction/i });
    expect(jurisdiction.closest('.ant-select')).toHaveTextContent(
      'United States (FAA, 14 CFR Part 101)',
    );
    const operation = screen.getByRole('combobox', { name: /operation/i });
    expect(operation.closest('.ant-select')).toHaveTextContent('Moored balloon');
    expect(screen.queryByText('us-14cfr101')).not.toBeInTheDocument();
  });

  it('renders readings of either kind as rows, and keeps the one reading a measurement needs', () => {
    const schema = KINDS.find((kind) => kind.id === 'lift-measurement')?.inputSchema ?? {};
    renderWithProviders(
      <Harness
        schema={schema}
        initial={{ readings: [{ kind: 'direct', timeS: 0, netLiftKg: 0.25 }] }}
      />,
    );
    const first = row('Reading 1');
    expect(within(first).getByRole('combobox', { name: /kind of reading/i })).toBeInTheDocument();
    expect(within(first).getByLabelText(/^net lift read directly/i)).toHaveValue('250 g');
    // At least one reading (the schema's minItems): the only one cannot be removed.
    expect(screen.getByRole('button', { name: 'Remove reading 1' })).toBeDisabled();

    fireEvent.click(screen.getByRole('button', { name: 'Add reading' }));
    // A new reading is of the first kind, with that kind's defaults.
    expect(JSON.parse(screen.getByLabelText('Reported inputs').textContent ?? '')).toEqual({
      readings: [
        { kind: 'direct', timeS: 0, netLiftKg: 0.25 },
        { kind: 'ballast', timeS: 0 },
      ],
    });
    expect(within(row('Reading 2')).getByLabelText(/^known mass/i)).toHaveValue('');
    expect(screen.getByRole('button', { name: 'Remove reading 1' })).toBeEnabled();
  });

  it('stops adding at maxItems and says why', () => {
    const schema = {
      type: 'object',
      properties: {
        things: {
          type: 'array',
          description: 'things to carry',
          itemLabel: 'thing',
          maxItems: 2,
          items: {
            type: 'object',
            properties: { massKg: { type: 'number', unit: 'kg', default: 0.5 } },
          },
        },
      },
    };
    renderWithProviders(<Harness schema={schema} initial={{ things: [{ massKg: 1 }] }} />);
    const add = screen.getByRole('button', { name: 'Add thing' });
    fireEvent.click(add);
    expect(JSON.parse(screen.getByLabelText('Reported inputs').textContent ?? '')).toEqual({
      things: [{ massKg: 1 }, { massKg: 0.5 }],
    });
    expect(add).toBeDisabled();
    expect(screen.getByText('At most 2 things; remove one to add another.')).toBeInTheDocument();
    fireEvent.click(screen.getByRole('button', { name: 'Remove thing 2' }));
    expect(add).toBeEnabled();
  });
});

const inputs = normaliseInputs('balloon-rules', {
  profileId: 'us-14cfr101',
  operation: 'free',
  packages: [{ massKg: 1.2, smallestSurfaceAreaM2: 0.02 }],
  suspensionSeparationForceN: 100,
}) as Record<string, unknown>;
const stored = evaluate('balloon-rules', inputs);

const detail: CalculationDetail = {
  id: '00000000-0000-4000-8000-000000000002',
  title: 'Radiosonde rules',
  kind: 'balloon-rules',
  owner: { id: 'u1', displayName: 'Owner' },
  visibility: 'private',
  tags: [],
  latestVersion: 1,
  status: 'draft',
  archived: false,
  createdAt: '2026-12-01T00:00:00Z',
  updatedAt: '2026-12-01T00:00:00Z',
  versions: [],
  latest: {
    number: 1,
    status: 'draft',
    note: '',
    author: { id: 'u1', displayName: 'Owner' },
    reviewer: null,
    engineVersion: '0.1.0',
    fingerprint: 'f'.repeat(64),
    createdAt: '2026-12-01T00:00:00Z',
    submittedAt: null,
    inputs,
    outputs: stored.outputs,
    steps: stored.steps,
    warnings: stored.warnings,
    series: null,
  },
  permissions: {
    edit: true,
    archive: true,
    submit: true,
    review: false,
    upload: true,
    export: true,
  },
  source: null,
  continuations: [],
  continueAs: [],
};

describe('the balloon rules check in the editor', () => {
  const crossedShown = () =>
    [...document.querySelectorAll('[data-warning^="rule-crossed-"]')].map((element) =>
      element.getAttribute('data-warning'),
    );
  const thresholdsCrossed = () =>
    document.querySelector('[data-output="thresholdsCrossed"]')?.textContent ?? '';

  it('recomputes the rules as packages are added, filled and removed', async () => {
    renderInRouter(<EditorBody detail={detail} refetch={() => undefined} unitSystem="si" />);
    expect(
      screen.getByRole('combobox', { name: /jurisdiction/i }).closest('.ant-select'),
    ).toHaveTextContent('United States (FAA, 14 CFR Part 101)');
    expect(thresholdsCrossed()).toMatch(/crossed\s*0/i);

    fireEvent.click(screen.getByRole('button', { name: 'Add package' }));
    // An empty package cannot be computed: its mass is asked for beside the field.
    await waitFor(() =>
      expect(within(row('Package 2')).getByText(/is required/)).toBeInTheDocument(),
    );
    expect(screen.getByRole('button', { name: 'Save as version 2' })).toBeDisabled();

    // 3 kg is over 6 lb (2.722 kg) and over 4 lb: rule (i) needs the smallest surface, and
    // says so beside that field of that package.
    fireEvent.change(massIn(row('Package 2')), { target: { value: '3 kg' } });
    await waitFor(() =>
      expect(
        within(row('Package 2')).getByText(/is needed for a package over 1\.814 kg/),
      ).toBeInTheDocument(),
    );
    fireEvent.change(areaIn(row('Package 2')), { target: { value: '0.05 m²' } });
    const twoPackages = {
      ...inputs,
      packages: [...(inputs.packages as unknown[]), { massKg: 3, smallestSurfaceAreaM2: 0.05 }],
    };
    const expected = evaluate('balloon-rules', twoPackages);
    // 14 CFR 101.1(a)(4)(ii): one package of more than 6 lb; 60 kg/m² stays under (i)'s
    // 3 oz/in² (131.8 kg/m²) and 4.2 kg under (iii)'s 12 lb (5.443 kg).
    expect(expected.outputs.thresholdsCrossed?.value).toBe(1);
    await waitFor(() =>
      expect(crossedShown()).toEqual(['rule-crossed-101.1(a)(4)(ii)-single-package-mass']),
    );
    expect(thresholdsCrossed()).toMatch(/crossed\s*1/i);
    expect(screen.getByRole('button', { name: 'Save as version 2' })).toBeEnabled();

    fireEvent.click(screen.getByRole('button', { name: 'Remove package 2' }));
    await waitFor(() => expect(crossedShown()).toEqual([]));
    expect(thresholdsCrossed()).toMatch(/crossed\s*0/i);
    expect(screen.queryByRole('group', { name: 'Package 2' })).not.toBeInTheDocument();
  });
});
