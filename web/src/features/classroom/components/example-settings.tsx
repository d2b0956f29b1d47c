import { Button, Form, Input, Select, Typography } from 'antd';
import type { UnitSystem } from '@loftwright/buoyancy';
import { FieldFormError } from '@/components/errors/field-form-error';
import {
  describeUnreadable,
  UnreadableFieldsContext,
  useUnreadableFields,
} from '@/components/reading/unreadable-fields';
import type { ExampleDetail } from '../api/classroom-api';
import { useExampleSettings } from '../hooks/use-example-settings';
import { exampleSettingsLabels } from './example-settings-labels';
import { ExerciseSettingsCard } from './exercise-settings-card';
import { StepNotesCard } from './step-notes-card';
import { TryRangesCard } from './try-ranges-card';

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
  const [unreadable, unreadableRegistry] = useUnreadableFields();
  const settings = useExampleSettings(example);

  return (
    <UnreadableFieldsContext.Provider value={unreadableRegistry}>
      <Form layout="vertical" aria-label="Example settings" onFinish={settings.save}>
        <Form.Item
          label="Introduction"
          htmlFor="example-intro"
          extra="Name the outside source a class can check the numbers against."
        >
          <Input.TextArea
            id="example-intro"
            rows={4}
            value={settings.intro}
            maxLength={4000}
            onChange={(event) => settings.setIntro(event.target.value)}
          />
        </Form.Item>
        <StepNotesCard
          steps={example.steps}
          notes={settings.notes}
          onNoteChange={settings.setNote}
        />
        <TryRangesCard
          example={example}
          ranges={settings.ranges}
          setRanges={settings.setRanges}
          unitSystem={unitSystem}
        />
        <Form.Item label="Show the chart at step" htmlFor="chart-step">
          <Select
            id="chart-step"
            style={{ maxWidth: 420 }}
            value={settings.chartStepId ?? ''}
            onChange={(value: string) => settings.setChartStepId(value || null)}
            options={[
              { value: '', label: 'After the last step' },
              ...example.steps.map((step, index) => ({
                value: step.id,
                label: `${index + 1}. ${step.label}`,
              })),
            ]}
          />
        </Form.Item>
        <ExerciseSettingsCard
          outputs={example.outputs}
          exercise={settings.exercise}
          unitSystem={unitSystem}
        />
        <FieldFormError
          error={settings.error}
          unitSystem={unitSystem}
          labels={exampleSettingsLabels(example)}
        />
        {unreadable.length > 0 ? (
          <Typography.Paragraph type="danger" role="alert">
            Not saved until these read: {describeUnreadable(unreadable)}
          </Typography.Paragraph>
        ) : null}
        <Button
          type="primary"
          htmlType="submit"
          loading={settings.saving}
          disabled={unreadable.length > 0}
        >
          Save settings
        </Button>
      </Form>
    </UnreadableFieldsContext.Provider>
  );
}
