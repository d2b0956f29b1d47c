import { Alert, Button, Spin } from 'antd';
import { describeInputs, KINDS, type UnitSystem } from '@loftwright/buoyancy';
import QRCode from 'qrcode';
import { useEffect, useState } from 'react';
import { Link } from 'react-router-dom';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { useNumberDisplay } from '@/components/reading/use-number-display';
import { stepNumber } from '@/components/results/step-number';
import { paths } from '@/config/paths';
import { localMoment } from '@/lib/local-moment';
import { useReviewedVersion } from '../api/sign-off-api';
import './sign-off-sheet.css';

const STATUS_WORDS = {
  draft: 'Draft',
  in_review: 'In review',
  approved: 'Approved',
  changes_requested: 'Changes requested',
} as const;

/** The verify page's address drawn as a QR code, for a phone held over the printed sheet. */
function VerifyQrCode({ url }: { url: string }) {
  const [image, setImage] = useState<string>();
  useEffect(() => {
    let current = true;
    void QRCode.toDataURL(url, { errorCorrectionLevel: 'M', margin: 2, scale: 4 }).then(
      (data) => current && setImage(data),
    );
    return () => {
      current = false;
    };
  }, [url]);
  return image ? (
    <img className="lw-sheet-qr" src={image} alt={`QR code of ${url}`} width={112} height={112} />
  ) : null;
}

/** The printable record of one version: inputs, results, derivation, warnings and the review. */
export function SignOffSheet({
  calculationId,
  title,
  kind,
  number: versionNumber,
  unitSystem,
}: {
  calculationId: string;
  title: string;
  kind: string;
  number: number;
  /** The reader's unit system: inputs and results are shown in it. */
  unitSystem: UnitSystem;
}) {
  const { numberFormat } = useReadingPreferences();
  const display = useNumberDisplay(unitSystem);
  const number = (value: number) => stepNumber(value, numberFormat);
  const version = useReviewedVersion(calculationId, versionNumber);
  if (version.isPending) return <Spin />;
  if (version.error) return <Alert type="error" showIcon title={version.error.message} />;
  const data = version.data;
  const approval = data.reviews.filter((review) => review.decision === 'approved').at(-1);
  const kindInfo = KINDS.find((candidate) => candidate.id === kind);
  const kindTitle = kindInfo?.title;
  const sections = describeInputs(kindInfo?.inputSchema, data.inputs, { unitSystem, numberFormat });
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
          Saved {localMoment(data.createdAt)} by {data.author?.displayName ?? 'unknown'}
          {data.note ? ` — ${data.note}` : ''}
        </p>
        {approval ? (
          <p>
            <strong>
              Approved {localMoment(approval.createdAt)} by{' '}
              {approval.reviewer?.displayName ?? 'unknown'}
            </strong>
          </p>
        ) : null}
        <div className="lw-sheet-check">
          <div>
            <p className="lw-sheet-caption">Content fingerprint (SHA-256)</p>
            <p className="lw-mono lw-sheet-fingerprint" data-testid="sheet-fingerprint">
              {data.fingerprint}
            </p>
            <p className="lw-sheet-caption">
              Scan the code or open this address to check the sheet:
            </p>
            <p className="lw-mono lw-sheet-url">{data.verifyUrl}</p>
          </div>
          <VerifyQrCode url={data.verifyUrl} />
        </div>
      </header>
      <h2>Inputs</h2>
      {sections.map((section, index) => (
        <section key={section.title ?? `loose-${index}`} className="lw-sheet-section">
          {section.title ? <h3>{section.title}</h3> : null}
          <table>
            <tbody>
              {section.lines.map((line) => (
                <tr key={line.path}>
                  <th scope="row">{line.label}</th>
                  <td>{line.text}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ))}
      <h2>Results</h2>
      <table>
        <tbody>
          {Object.entries(data.outputs).map(([name, output]) => (
            <tr key={name}>
              <th scope="row">{output.label}</th>
              <td className="lw-mono">{display.outputText(output.value, output.unit)}</td>
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
          {localMoment(approval.createdAt)}. Comment: {approval.comment || '—'}.
        </p>
      ) : (
        <p>Not approved: this sheet is not a sign-off.</p>
      )}
    </article>
  );
}
