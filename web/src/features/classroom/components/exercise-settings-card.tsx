import { Card, Checkbox, Form, InputNumber, Select, Switch } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { QuantityInput } from '@/components/quantity/quantity-input';
import type { ExampleDetail } from '../api/classroom-api';
import type { ExerciseSettingsFields } from '../hooks/use-example-settings';

const REVEAL_OPTIONS = [
  { value: 'after-correct', label: 'after a right answer' },
  { value: 'after-attempts', label: 'after a right answer or a number of tries' },
  { value: 'when-closed', label: 'only when the class is closed' },
] as const;

/** Whether the example is an exercise: the results students work out, tolerance, reveal rule. */
export function ExerciseSettingsCard({
  outputs,
  exercise,
  unitSystem,
}: {
  outputs: ExampleDetail['outputs'];
  exercise: ExerciseSettingsFields;
  unitSystem: UnitSystem;
}) {
  return (
    <Card size="small" title="Exercise" style={{ marginBottom: 16 }}>
      <Form.Item label="Students work out some results themselves" htmlFor="is-exercise">
        <Switch id="is-exercise" checked={exercise.isExercise} onChange={exercise.setIsExercise} />
      </Form.Item>
      {exercise.isExercise ? (
        <>
          <Form.Item label="Results to hide">
            <Checkbox.Group
              value={exercise.hidden}
              onChange={(values) => exercise.setHidden(values)}
              options={Object.entries(outputs).map(([name, output]) => ({
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
              value={exercise.tolerance / 100}
              onChange={(share) =>
                exercise.setTolerance(share === undefined ? Number.NaN : share * 100)
              }
            />
          </Form.Item>
          <Form.Item label="Show the engine’s values to a student" htmlFor="reveal">
            <Select
              id="reveal"
              aria-label="Show the engine’s values to a student"
              style={{ maxWidth: 360 }}
              value={exercise.reveal}
              onChange={exercise.setReveal}
              options={[...REVEAL_OPTIONS]}
            />
          </Form.Item>
          {exercise.reveal === 'after-attempts' ? (
            <Form.Item label="Tries before the values are shown" htmlFor="reveal-attempts">
              <InputNumber
                id="reveal-attempts"
                min={1}
                max={20}
                precision={0}
                value={exercise.revealAfterAttempts}
                onChange={(value) => exercise.setRevealAfterAttempts(value ?? 1)}
              />
            </Form.Item>
          ) : null}
        </>
      ) : null}
    </Card>
  );
}
