import { CheckCircleFilled, CloseCircleFilled } from '@ant-design/icons';
import { Alert, Button, Card, Form, List, Space, Tag, theme, Typography } from 'antd';
import { dimensionOfSIUnit, type UnitSystem } from '@loftwright/buoyancy';
import { useState } from 'react';
import { FormError } from '@/components/errors/form-error';
import { type NumberDisplay, useNumberDisplay } from '@/components/reading/use-number-display';
import { QuantityInput } from '@/components/quantity/quantity-input';
import { type ExampleDetail, type Submission, useSubmitAnswers } from '../api/classroom-api';

function shown(value: number | null, unit: string, show: NumberDisplay) {
  if (value === null) return '—';
  return show.outputText(value, unit);
}

/** The engine's verdict on one attempt: each answer right or wrong, and where it went wrong. */
export function SubmissionResult({
  submission,
  steps,
  unitSystem,
  revealed = true,
}: {
  submission: Submission;
  steps: ExampleDetail['steps'];
  unitSystem: UnitSystem;
  /** Whether the engine's values may be shown (the teacher's rule). */
  revealed?: boolean;
}) {
  const { token } = theme.useToken();
  const show = useNumberDisplay(unitSystem);
  const { check } = submission;
  const wrongIndex = steps.findIndex((step) => step.id === check.firstWrongStepId);
  return (
    <Card
      size="small"
      title={`Attempt ${submission.attempt}: ${submission.correctCount} of ${submission.answerCount} right`}
      aria-label={`Result of attempt ${submission.attempt}`}
    >
      {submission.allCorrect ? (
        <Alert
          type="success"
          showIcon
          title={`All right, within ${check.tolerancePercent} % of the engine’s values.`}
        />
      ) : (
        <Alert
          type="error"
          showIcon
          title={
            wrongIndex >= 0
              ? `It went wrong at step ${wrongIndex + 1}: ${steps[wrongIndex]?.label ?? ''}.`
              : 'Some answers are not right yet.'
          }
          description={
            revealed
              ? 'The walk-through now shows every step; the one marked is where to look again.'
              : 'Look again from the step named; the engine’s values are shown when your teacher’s rule allows.'
          }
        />
      )}
      <List
        size="small"
        dataSource={check.answers}
        renderItem={(answer) => (
          <List.Item key={answer.output} data-answer={answer.output}>
            <Space wrap>
              {answer.correct ? (
                <CheckCircleFilled style={{ color: token.colorSuccess }} aria-hidden />
              ) : (
                <CloseCircleFilled style={{ color: token.colorError }} aria-hidden />
              )}
              <Typography.Text strong>{answer.label}</Typography.Text>
              <Tag color={answer.correct ? 'success' : 'error'}>
                {answer.correct ? 'right' : 'wrong'}
              </Tag>
              <span>
                yours <span className="lw-mono">{shown(answer.given, answer.unit, show)}</span>
                {answer.expected !== null ? (
                  <>
                    , engine{' '}
                    <span className="lw-mono">{shown(answer.expected, answer.unit, show)}</span>
                  </>
                ) : null}
                {answer.relativeError !== null
                  ? ` (${show.fixed(answer.relativeError * 100, 2)} % off)`
                  : ''}
              </span>
            </Space>
          </List.Item>
        )}
      />
    </Card>
  );
}

/**
 * The exercise: an answer for each hidden result, typed with its unit, checked by the engine on
 * the server at the teacher's tolerance.
 */
export function ExercisePanel({
  example,
  unitSystem,
}: {
  example: ExampleDetail;
  unitSystem: UnitSystem;
}) {
  const submit = useSubmitAnswers(example.id);
  const [answers, setAnswers] = useState<Record<string, number | undefined>>({});
  const latest = example.mySubmissions[0];
  const canSubmit = example.standing === 'student' && !example.classroomClosed;
  return (
    <Space orientation="vertical" size="middle" style={{ width: '100%' }}>
      <Typography.Paragraph style={{ margin: 0 }}>
        Work out each result below from the example’s inputs and type it with its unit. An answer
        counts as right within {example.exercise?.tolerancePercent} % of the engine’s value.
      </Typography.Paragraph>
      {example.classroomClosed ? (
        <Alert type="info" showIcon title="The class is closed; it takes no more answers." />
      ) : null}
      <Form
        layout="vertical"
        aria-label="Your answers"
        onFinish={() =>
          submit.mutate(
            Object.fromEntries(
              example.questions.map((question) => [
                question.output,
                answers[question.output] ?? null,
              ]),
            ),
          )
        }
      >
        {example.questions.map((question) => {
          const dimension = dimensionOfSIUnit(question.unit) ?? 'coefficient';
          const id = `answer-${question.output}`;
          return (
            <Form.Item
              key={question.output}
              label={question.label}
              htmlFor={id}
              style={{ maxWidth: 360 }}
            >
              <QuantityInput
                id={id}
                label={question.label}
                dimension={dimension}
                value={answers[question.output]}
                unitSystem={unitSystem}
                disabled={!canSubmit}
                onChange={(value) => setAnswers((now) => ({ ...now, [question.output]: value }))}
              />
            </Form.Item>
          );
        })}
        <FormError error={submit.error} />
        <Button type="primary" htmlType="submit" loading={submit.isPending} disabled={!canSubmit}>
          {latest ? 'Submit again' : 'Submit answers'}
        </Button>
      </Form>
      {latest ? (
        <SubmissionResult
          submission={latest}
          steps={example.steps}
          unitSystem={unitSystem}
          revealed={example.revealed}
        />
      ) : null}
    </Space>
  );
}
