import { Alert, Button, Spin } from 'antd';
import { KINDS, type UnitSystem } from '@loftwright/buoyancy';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useReviewedVersion } from '../api/sign-off-api';
import { SheetHeader } from './sheet-header';
import { SheetInputs } from './sheet-inputs';
import { SheetResults } from './sheet-results';
import { SheetReview } from './sheet-review';
import './sign-off-sheet.css';

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
      <SheetHeader version={data} title={title} kindTitle={kindTitle} approval={approval} />
      <SheetInputs kind={kind} inputs={data.inputs} unitSystem={unitSystem} />
      <SheetResults version={data} unitSystem={unitSystem} />
      <SheetReview warnings={data.warnings} approval={approval} />
    </article>
  );
}
