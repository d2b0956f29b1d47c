import {
  App,
  Button,
  Card,
  Checkbox,
  Form,
  Input,
  InputNumber,
  Select,
  Space,
  Switch,
  Typography,
} from 'antd';
import {
  formatQuantity,
  numberAtPath,
  numericInputPaths,
  type UnitSystem,
} from '@loftwright/buoyancy';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { useState } from 'react';
import { FieldFormError } from '@/components/errors/field-form-error';
import { QuantityInput } from '@/components/quantity/quantity-input';
import {
  describeUnreadable,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import {
  type ExampleDetail,
  type RevealRule,
  type TryRanges,
  useUpdateExample,
} from '../api/classroom-api';
import { inputFieldInfo } from '../lib/input-field';

/**
 * What the teacher sets around a published example: the introduction, a note per step, the
 * inputs students may try and their ranges, where the chart appears, and the exercise.
 */
export function ExampleSettingsForm({
  example,
  unitSystem,
}: {
  example: ExampleDetail;
  unitSystem: UnitSystem;
}) {
  const { message } = App.useApp();
  const [unreadable, unreadableRegistry] = useUnreadableFields();
  const { numberFormat } = useReadingPreferences();
  const update = useUpdateExample(example.id);
  const [intro, setIntro] = useState(example.intro);
  const [notes, setNotes] = useState<Record<string, string>>(example.stepNotes);
  const [ranges, setRanges] = useState<TryRanges>(example.tryRanges);
  const [chartStepId, setChartStepId] = useState<string | null>(example.chartStepId);
  const [isExercise, setIsExercise] = useState(example.exercise !== null);
  const [hidden, setHidden] = useState<string[]>(example.exercise?.hiddenOutputs ?? []);
  const [tolerance, setTolerance] = useState<number>(example.exercise?.tolerancePercent ?? 2);
  const [reveal, setReveal] = useState<RevealRule>(example.exercise?.reveal ?? 'after-correct');
  const [revealAfterAttempts, setRevealAfterAttempts] = useState<number>(
    example.exercise?.revealAfterAttempts ?? 3,
  );
  const paths = numericInputPaths(example.inputs);

  const save = () =>
    update.mutate(
      {
        intro,
        stepNotes: Object.fromEntries(Object.entries(notes).filter(([, note]) => note.trim())),
        tryRanges: ranges,
        chartStepId,
        exercise: isExercise
          ? {
              hiddenOutputs: hidden,
              tolerancePercent: tolerance,
              reveal,
              ...(reveal === 'after-attempts' ? { revealAfterAttempts } : {}),
            }
          : null,
      },
      { onSuccess: () => void message.success('Example settings saved') },
    );

  return (
    <UnreadableFieldsContext.Provider value={unreadableRegistry}>
      <Form layout="vertical" aria-label="Example settings" onFinish={save}>
        <Form.Item
          label="Introduction"
          htmlFor="example-intro"
          extra="Name the outside source a class can check the numbers against."
        >
          <Input.TextArea
            id="example-intro"
            rows={4}
            value={intro}
            maxLength={4000}
            onChange={(event) => setIntro(event.target.value)}
          />
        </Form.Item>

        <Card size="small" title="Notes on the steps" style={{ marginBottom: 16 }}>
          {example.steps.map((step, index) => (
            <Form.Item
              key={step.id}
              label={`${index + 1}. ${step.label}`}
              htmlFor={`note-${step.id}`}
            >
              <Input.TextArea
                id={`note-${step.id}`}
                rows={1}
                autoSize={{ minRows: 1, maxRows: 4 }}
                value={notes[step.id] ?? ''}
                maxLength={2000}
                onChange={(event) => setNotes((now) => ({ ...now, [step.id]: event.target.value }))}
              />
            </Form.Item>
          ))}
        </Card>

        <Card
          size="small"
          title="Try it yourself: inputs students may change"
          style={{ marginBottom: 16 }}
        >
          <Typography.Paragraph type="secondary">
            Type each end with its unit, as in the editor; the example’s own value must lie inside.
          </Typography.Paragraph>
          {paths.map((path) => {
            const info = inputFieldInfo(example.kind, path);
            const dimension = info.dimension ?? 'coefficient';
            const value = numberAtPath(example.inputs, path) ?? 0;
            const range = ranges[path];
            return (
              <Space key={path} wrap style={{ display: 'flex', marginBottom: 8 }} data-range={path}>
                <Checkbox
                  checked={range !== undefined}
                  onChange={(event) =>
                    setRanges((now) => {
                      const others = Object.fromEntries(
                        Object.entries(now).filter(([key]) => key !== path),
                      );
                      if (!event.target.checked) return others;
                      // A starting range around the example's value, for the teacher to narrow.
                      const range =
                        value > 0
                          ? { min: value / 2, max: value * 2 }
                          : value < 0
                            ? { min: value * 2, max: value / 2 }
                            : { min: 0, max: 1 };
                      return { ...others, [path]: range };
                    })
                  }
                >
                  {info.label}{' '}
                  <span className="lw-mono">
                    (
                    {
                      formatQuantity(value, dimension, unitSystem, {
                        numberFormat,
                        trimZeros: true,
                      }).text
                    }
                    )
                  </span>
                </Checkbox>
                {range ? (
                  <>
                    <QuantityInput
                      label={`${info.label}: lowest value`}
                      dimension={dimension}
                      unitSystem={unitSystem}
                      value={range.min}
                      onChange={(min) =>
                        setRanges((now) => ({
                          ...now,
                          [path]: { ...range, min: min ?? Number.NaN },
                        }))
                      }
                    />
                    <QuantityInput
                      label={`${info.label}: highest value`}
                      dimension={dimension}
                      unitSystem={unitSystem}
                      value={range.max}
                      onChange={(max) =>
                        setRanges((now) => ({
                          ...now,
                          [path]: { ...range, max: max ?? Number.NaN },
                        }))
                      }
                    />
                  </>
                ) : null}
              </Space>
            );
          })}
        </Card>

        <Form.Item label="Show the chart at step" htmlFor="chart-step">
          <Select
            id="chart-step"
            style={{ maxWidth: 420 }}
            value={chartStepId ?? ''}
            onChange={(value: string) => setChartStepId(value || null)}
            options={[
              { value: '', label: 'After the last step' },
              ...example.steps.map((step, index) => ({
                value: step.id,
                label: `${index + 1}. ${step.label}`,
              })),
            ]}
          />
        </Form.Item>

        <Card size="small" title="Exercise" style={{ marginBottom: 16 }}>
          <Form.Item label="Students work out some results themselves" htmlFor="is-exercise">
            <Switch id="is-exercise" checked={isExercise} onChange={setIsExercise} />
          </Form.Item>
          {isExercise ? (
            <>
              <Form.Item label="Results to hide">
                <Checkbox.Group
                  value={hidden}
                  onChange={(values) => setHidden(values)}
                  options={Object.entries(example.outputs).map(([name, output]) => ({
                    value: name,
                    label: output.label,
                  }))}
                />
              </Form.Item>
              <Form.Item label="Tolerance" htmlFor="tolerance">
                <QuantityInput
                  id="tolerance"
                  label="Tolerance"
                  dimension="fraction"
                  unitSystem={unitSystem}
                  range={{ min: 0.001, max: 0.5 }}
                  value={tolerance / 100}
                  onChange={(share) => setTolerance(share === undefined ? Number.NaN : share * 100)}
                />
              </Form.Item>
              <Form.Item label="Show the engine’s values to a student" htmlFor="reveal">
                <Select
                  id="reveal"
                  aria-label="Show the engine’s values to a student"
                  style={{ maxWidth: 360 }}
                  value={reveal}
                  onChange={setReveal}
                  options={[
                    { value: 'after-correct', label: 'after a right answer' },
                    { value: 'after-attempts', label: 'after a right answer or a number of tries' },
                    { value: 'when-closed', label: 'only when the class is closed' },
                  ]}
                />
              </Form.Item>
              {reveal === 'after-attempts' ? (
                <Form.Item label="Tries before the values are shown" htmlFor="reveal-attempts">
                  <InputNumber
                    id="reveal-attempts"
                    min={1}
                    max={20}
                    precision={0}
                    value={revealAfterAttempts}
                    onChange={(value) => setRevealAfterAttempts(value ?? 1)}
                  />
                </Form.Item>
              ) : null}
            </>
          ) : null}
        </Card>
        <FieldFormError
          error={update.error}
          unitSystem={unitSystem}
          labels={(field) => {
            if (field.startsWith('tryRanges.')) {
              const info = inputFieldInfo(example.kind, field.slice('tryRanges.'.length));
              return {
                label: `Range of ${info.label.toLowerCase()} for trying`,
                ...(info.dimension ? { dimension: info.dimension } : {}),
              };
            }
            if (field.startsWith('stepNotes.')) {
              const step = example.steps.find((candidate) => `stepNotes.${candidate.id}` === field);
              return { label: `Note on “${step?.label ?? field.slice('stepNotes.'.length)}”` };
            }
            if (field === 'chartStepId') return { label: 'Chart' };
            if (field === 'exercise.hiddenOutputs')
              return { label: 'Results the students work out' };
            return undefined;
          }}
        />
        {unreadable.length > 0 ? (
          <Typography.Paragraph type="danger" role="alert">
            Not saved until these read: {describeUnreadable(unreadable)}
          </Typography.Paragraph>
        ) : null}
        <Button
          type="primary"
          htmlType="submit"
          loading={update.isPending}
          disabled={unreadable.length > 0}
        >
          Save settings
        </Button>
      </Form>
    </UnreadableFieldsContext.Provider>
  );
}
