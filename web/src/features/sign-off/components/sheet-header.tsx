import { localMoment } from '@/lib/local-moment';
import type { ReviewedVersion } from '../api/sign-off-api';
import { VerifyQrCode } from './verify-qr-code';

const STATUS_WORDS = {
  draft: 'Draft',
  in_review: 'In review',
  approved: 'Approved',
  changes_requested: 'Changes requested',
} as const;

/**
 * The head of the sheet: title, version, status, kind and engine, who saved and approved it, and
 * the fingerprint with the address (and QR code) to verify it.
 */
export function SheetHeader({
  version,
  title,
  kindTitle,
  approval,
}: {
  version: ReviewedVersion;
  title: string;
  kindTitle: string | undefined;
  approval: ReviewedVersion['reviews'][number] | undefined;
}) {
  return (
    <header>
      <p className="lw-sheet-product">Loftwright</p>
      {/* An approved sheet keeps the title that was approved, whatever the calculation is
          called now. */}
      <h1>{approval?.calculationTitle ?? title}</h1>
      <p>
        Version <span className="lw-mono">{version.number}</span> · {STATUS_WORDS[version.status]}
        {kindTitle ? ` · ${kindTitle}` : ''} · engine{' '}
        <span className="lw-mono">{version.engineVersion}</span>
      </p>
      <p>
        Saved {localMoment(version.createdAt)} by {version.author?.displayName ?? 'unknown'}
        {version.note ? ` — ${version.note}` : ''}
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
            {version.fingerprint}
          </p>
          <p className="lw-sheet-caption">Scan the code or open this address to check the sheet:</p>
          <p className="lw-mono lw-sheet-url">{version.verifyUrl}</p>
        </div>
        <VerifyQrCode url={version.verifyUrl} />
      </div>
    </header>
  );
}
