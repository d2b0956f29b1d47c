import { localMoment } from '@/lib/local-moment';
import type { ReviewedVersion } from '../api/sign-off-api';

/** The warnings and cautions of the version, then who approved it, or that nobody has. */
export function SheetReview({
  warnings,
  approval,
}: {
  warnings: ReviewedVersion['warnings'];
  approval: ReviewedVersion['reviews'][number] | undefined;
}) {
  return (
    <>
      {warnings.length ? (
        <>
          <h2>Warnings and cautions</h2>
          <ul>
            {warnings.map((warning) => (
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
    </>
  );
}
