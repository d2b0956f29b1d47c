import { Alert, Tag, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { ExampleDetail } from '../api/classroom-api';

const SEVERITY = { caution: 'error', warning: 'warning', note: 'info' } as const;

/** The class the example belongs to, and the example's title, marked if it is an exercise. */
export function ExampleTitle({ example }: { example: ExampleDetail }) {
  return (
    <>
      <Typography.Text type="secondary">
        <Link to={paths.classroom.href(example.classroomId)}>{example.classroomTitle}</Link>
      </Typography.Text>
      <Typography.Title level={2} style={{ marginTop: 4 }}>
        {example.title}{' '}
        {example.exercise ? (
          <Tag color="warning">exercise, ±{example.exercise.tolerancePercent} %</Tag>
        ) : null}
      </Typography.Title>
    </>
  );
}

/** Who published the example, from which version and engine; the copy stays as published. */
export function ExamplePublishedNote({ example }: { example: ExampleDetail }) {
  return (
    <Typography.Text type="secondary" style={{ fontSize: 12 }}>
      Published by {example.teacher.displayName} from version {example.versionNumber} of the
      calculation (fingerprint <span className="lw-mono">{example.fingerprint.slice(0, 12)}</span>,
      engine {example.engineVersion}). This copy does not change when the calculation does.
    </Typography.Text>
  );
}

/** A caution or warning of the example's result. */
export function ExampleWarningAlert({ warning }: { warning: ExampleDetail['warnings'][number] }) {
  return (
    <Alert
      type={SEVERITY[warning.severity]}
      showIcon
      title={warning.severity === 'caution' ? 'Caution' : 'Check this'}
      description={warning.message}
      data-warning={warning.code}
    />
  );
}
