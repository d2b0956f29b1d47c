import { Alert, Button, Card, Form, Input, Select } from 'antd';
import { useState } from 'react';
import { FormError } from '@/components/errors/form-error';
import {
  usePublishableCalculations,
  usePublishExample,
  useVersionChoices,
} from '../api/classroom-api';

/**
 * Publishes one version of a calculation to the class as a worked example: the teacher's own, or
 * one a reviewer approved. The class gets a copy of that version that later edits do not touch.
 */
export function PublishExampleForm({
  classId,
  userId,
  onPublished,
}: {
  classId: string;
  userId: string;
  onPublished: (exampleId: string) => void;
}) {
  const calculations = usePublishableCalculations();
  const publish = usePublishExample(classId);
  const [calculationId, setCalculationId] = useState<string>();
  const [versionNumber, setVersionNumber] = useState<number>();
  const [title, setTitle] = useState('');
  const [intro, setIntro] = useState('');
  const detail = useVersionChoices(calculationId);
  const own = detail.data?.owner?.id === userId;
  const versions = (detail.data?.versions ?? []).filter(
    (version) => own || version.status === 'approved',
  );
  return (
    <Card size="small" title="Publish a worked example">
      <Form
        layout="vertical"
        aria-label="Publish a worked example"
        onFinish={() =>
          calculationId &&
          versionNumber &&
          publish.mutate(
            { calculationId, versionNumber, title: title || undefined, intro },
            {
              onSuccess: (example) => {
                setTitle('');
                setIntro('');
                onPublished(example.id);
              },
            },
          )
        }
      >
        <Form.Item label="Calculation" htmlFor="publish-calculation">
          <Select
            id="publish-calculation"
            showSearch={{ optionFilterProp: 'label' }}
            placeholder="One of yours, or an approved one"
            loading={calculations.isPending}
            value={calculationId}
            onChange={(id: string) => {
              setCalculationId(id);
              setVersionNumber(undefined);
            }}
            options={(calculations.data ?? []).map((calculation) => ({
              value: calculation.id,
              label: calculation.title,
            }))}
          />
        </Form.Item>
        {calculationId ? (
          versions.length === 0 && !detail.isPending ? (
            <Alert
              type="info"
              showIcon
              style={{ marginBottom: 16 }}
              title="This calculation is not yours and has no approved version to publish."
            />
          ) : (
            <Form.Item label="Version" htmlFor="publish-version">
              <Select
                id="publish-version"
                loading={detail.isPending}
                value={versionNumber}
                onChange={(number: number) => setVersionNumber(number)}
                options={[...versions].reverse().map((version) => ({
                  value: version.number,
                  label: `v${version.number}, ${version.status.replace('_', ' ')}${version.note ? `: ${version.note}` : ''}`,
                }))}
              />
            </Form.Item>
          )
        ) : null}
        <Form.Item
          label="Title for the class"
          htmlFor="publish-title"
          extra="Leave empty to use the calculation’s title."
        >
          <Input
            id="publish-title"
            value={title}
            maxLength={200}
            onChange={(event) => setTitle(event.target.value)}
          />
        </Form.Item>
        <Form.Item
          label="Introduction"
          htmlFor="publish-intro"
          extra="What the class works out, and the outside source to check it against."
        >
          <Input.TextArea
            id="publish-intro"
            rows={3}
            value={intro}
            maxLength={4000}
            onChange={(event) => setIntro(event.target.value)}
          />
        </Form.Item>
        <FormError error={publish.error} />
        <Button
          type="primary"
          htmlType="submit"
          loading={publish.isPending}
          disabled={!calculationId || !versionNumber}
        >
          Publish to the class
        </Button>
      </Form>
    </Card>
  );
}
