import { Alert, Button, Spin } from 'antd';
import { KINDS, type NumberFormat } from '@loftwright/buoyancy';
import { Link } from 'react-router-dom';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { stepNumber } from '@/components/results/step-number';
import { paths } from '@/config/paths';
import { useReviewedVersion } from '../api/sign-off-api';
import './sign-off-sheet.css';

const STATUS_WORDS = {
  draft: 'Draft',
  in_review: 'In review',
  approved: 'Approved',
  changes_requested: 'Changes requested',
} as const;

function leaves(value: unknown, numberFormat: NumberFormat, prefix = ''): [string, string][] {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    return Object.entries(value).flatMap(([key, child]) =>
      leaves(child, numberFormat, prefix ? `${prefix}.${key}` : key),
    );
  }
  const text = Array.isArray(value)
    ? JSON.stringify(value)
    : typeof value === 'number'
      ? stepNumber(value, numberFormat)
      : String(value);
  return [[prefix, text]];
}

/** The printable record of one version: inputs, results, derivation, warnings and the review. */
export function SignOffSheet({
  calculationId,
  title,
  kind,
  number: versionNumber,
}: {
  calculationId: string;
  title: string;
  kind: string;
  number: number;
}) {
  const { numberFormat } = useReadingPreferences();
  const number = (value: number) => stepNumber(value, numberFormat);
  const version = useReviewedVersion(calculationId, versionNumber);
  if (version.isPending) return <Spin />;
  if (version.error) return <Alert type="error" showIcon title={version.error.message} />;
  const data = version.data;
  const approval = data.reviews.filter((review) => review.decision === 'approved').at(-1);
  const kindTitle = KINDS.find((candidate) => candidate.id === kind)?.title;
  return (
    <article className="lw-sheet" aria-label="Sign-off sheet">
      <div className="lw-sheet-actions">
        <Button type="primary" onClick={() => window.print()}>
          Print / save as PDF
        </Button>{' '}
        <Link to={paths.verify.href(data.fingerprint)}>Verify this fingerprint</Link>
      </div>
      <header>
        <p className="lw-sheet-product">Loftwright</p>
        {/* An approved sheet keeps the title that was approved, whatever the calculation is
            called now. */}
        <h1>{approval?.calculationTitle ?? title}</h1>
        <p>
          Version <span className="lw-mono">{data.number}</span> · {STATUS_WORDS[data.status]}
          {kindTitle ? ` · ${kindTitle}` : ''} · engine{' '}
          <span className="lw-mono">{data.engineVersion}</span>
        </p>
        <p>
          Fingerprint{' '}
          <span className="lw-mono">
            {data.fingerprint.slice(0, 16)}…{data.fingerprint.slice(-8)}
          </span>{' '}
          (SHA-256; check it at /verify/
          <span className="lw-mono">{data.fingerprint.slice(0, 8)}…</span>)
        </p>
        <p>
          Saved {new Date(data.createdAt).toLocaleString()} by{' '}
          {data.author?.displayName ?? 'unknown'}
          {data.note ? ` — ${data.note}` : ''}
        </p>
      </header>
      <h2>Inputs</h2>
      <table>
        <tbody>
          {leaves(data.inputs, numberFormat).map(([path, value]) => (
            <tr key={path}>
              <th scope="row">{path}</th>
              <td className="lw-mono">{value}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <h2>Results</h2>
      <table>
        <tbody>
          {Object.entries(data.outputs).map(([name, output]) => (
            <tr key={name}>
              <th scope="row">{output.label}</th>
              <td className="lw-mono">
                {number(output.value)} {output.unit}
              </td>
              <td>{output.context ?? ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <h2>Derivation</h2>
      <ol>
        {data.steps.map((step) => (
          <li key={step.id}>
            <strong>{step.label}</strong>: <span className="lw-mono">{step.formula}</span>
            {step.values.length ? (
              <span className="lw-mono">
                {' '}
                with{' '}
                {step.values
                  .map((value) => `${value.symbol} = ${number(value.value)} ${value.unit}`)
                  .join(', ')}
              </span>
            ) : null}
            <span className="lw-mono">
              {' '}
              → {step.result.symbol} = {number(step.result.value)} {step.result.unit}
            </span>{' '}
            <em>({step.source})</em>
          </li>
        ))}
      </ol>
      {data.warnings.length ? (
        <>
          <h2>Warnings and cautions</h2>
          <ul>
            {data.warnings.map((warning) => (
              <li key={warning.code}>{warning.message}</li>
            ))}
          </ul>
        </>
      ) : null}
      <h2>Review</h2>
      {approval ? (
        <p>
          Approved by {approval.reviewer?.displayName ?? 'unknown'} on{' '}
          {new Date(approval.createdAt).toLocaleString()}. Comment: {approval.comment || '—'}.
          Approved fingerprint <span className="lw-mono">{approval.fingerprint.slice(0, 16)}…</span>
        </p>
      ) : (
        <p>Not approved: this sheet is not a sign-off.</p>
      )}
    </article>
  );
}
