import { Alert, Card, Typography } from 'antd';
import { inputLabel, KINDS } from '@loftwright/buoyancy';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { CalculationDetail, CalculationSource } from '../api/calculations-api';
import type { SourceVersionState } from '../hooks/use-source-version';
import { NewerSourceNotice } from './newer-source-notice';

const kindTitle = (id: string) => KINDS.find((kind) => kind.id === id)?.title ?? id;

function SourceLine({ source }: { source: CalculationSource }) {
  if (!source.calculationId) {
    return (
      <Typography.Paragraph>
        Continued from a {kindTitle(source.kind).toLowerCase()} you cannot open (its version{' '}
        {source.versionNumber}).
      </Typography.Paragraph>
    );
  }
  return (
    <Typography.Paragraph>
      Continued from: {kindTitle(source.kind)}{' '}
      <Link to={paths.calculation.href(source.calculationId)}>“{source.title}”</Link>, version{' '}
      {source.versionNumber}
    </Typography.Paragraph>
  );
}

/**
 * Where this calculation came from and what continues from it (the design chain), with the
 * newer-source notice and the fields still holding the kind's example values.
 */
export function LinkedPanel({
  detail,
  schema,
  link,
}: {
  detail: CalculationDetail;
  schema: Record<string, unknown>;
  link: SourceVersionState;
}) {
  const { source, continuations } = detail;
  if (!source && continuations.length === 0) return null;
  return (
    <section aria-label="Linked">
      <Card size="small" title="Linked" style={{ marginBottom: 12 }}>
        {source ? <SourceLine source={source} /> : null}
        {source ? (
          <NewerSourceNotice
            source={source}
            schema={schema}
            link={link}
            editable={detail.permissions.edit}
          />
        ) : null}
        {source && source.needs.length > 0 ? (
          <Alert
            type="warning"
            showIcon
            title={`Still to fill: ${source.needs.map((path) => inputLabel(schema, path)).join(', ')}`}
            description="The source does not give these; they hold the kind’s example values until you change them and save."
            style={{ marginBottom: 8 }}
          />
        ) : null}
        {continuations.length > 0 ? (
          <Typography.Paragraph style={{ marginBottom: 0 }}>
            Continued in:{' '}
            {continuations.map((item, index) => (
              <span key={item.id}>
                {index > 0 ? '; ' : ''}
                {kindTitle(item.kind)}{' '}
                <Link to={paths.calculation.href(item.id)}>“{item.title}”</Link>
              </span>
            ))}
          </Typography.Paragraph>
        ) : null}
      </Card>
    </section>
  );
}
