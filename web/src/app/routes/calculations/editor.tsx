import { Typography } from 'antd';
import { useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { AttachmentsPanel } from '@/features/attachments/components/attachments-panel';
import { useMe } from '@/features/auth/api/auth-api';
import { useCalculation } from '@/features/calculations/api/calculations-api';
import { CalculationEditor } from '@/features/calculations/components/calculation-editor';
import { VersionCompare } from '@/features/calculations/components/version-compare';
import { VersionHistory } from '@/features/calculations/components/version-history';
import { ReviewDecision } from '@/features/reviews/components/review-decision';

export function CalculationEditorRoute() {
  const { id = '' } = useParams();
  const { user } = useMe();
  const calculation = useCalculation(id);
  const latest = calculation.data?.latest;
  const mayReview =
    user !== undefined &&
    latest !== null &&
    latest !== undefined &&
    user.roles.includes('reviewer') &&
    latest.status === 'in_review' &&
    latest.author?.id !== user.id &&
    (latest.reviewer === null || latest.reviewer.id === user.id);
  return (
    <>
      {mayReview ? <ReviewDecision calculationId={id} number={latest.number} /> : null}
      <CalculationEditor key={id} id={id} unitSystem={user?.unitSystem ?? 'si'} />
      {calculation.data && user ? (
        <AttachmentsPanel
          calculationId={id}
          canUpload={calculation.data.permissions.edit || user.roles.includes('admin')}
          canRemove={(file) =>
            user.roles.includes('admin') ||
            (file.uploadedBy?.id === user.id && file.versionNumber === null)
          }
        />
      ) : null}
      {calculation.data ? (
        <section aria-label="Versions" style={{ marginTop: 24 }}>
          <Typography.Title level={4}>Versions</Typography.Title>
          <VersionHistory
            versions={calculation.data.versions}
            sheetHref={(n) => paths.sheet.href(id, n)}
          />
          <Typography.Title level={4} style={{ marginTop: 24 }}>
            Compare versions
          </Typography.Title>
          <VersionCompare
            calculationId={id}
            versions={calculation.data.versions}
            unitSystem={user?.unitSystem ?? 'si'}
          />
        </section>
      ) : null}
    </>
  );
}
