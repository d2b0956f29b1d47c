import { App, Button, Space, Typography } from 'antd';
import { kindCapabilities } from '@loftwright/buoyancy';
import { lazy, Suspense, useMemo } from 'react';
import { useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { Attachment } from '@/features/attachments/api/attachments-api';
import { useMe } from '@/features/auth/api/auth-api';
import {
  downloadCalculationFile,
  useCalculation,
} from '@/features/calculations/api/calculations-api';
import { CalculationEditor } from '@/features/calculations/components/calculation-editor';
import { VersionCompare } from '@/features/calculations/components/version-compare';
import { VersionHistory } from '@/features/calculations/components/version-history';
import { PanelBoundary } from '@/components/errors/panel-boundary';
import { FieldRemarksContext } from '@/components/reading/field-remarks';
import { useReviewComments } from '@/features/reviews/api/reviews-api';
import { ReviewCommentsPanel } from '@/features/reviews/components/review-comments-panel';
import { ReviewDecision } from '@/features/reviews/components/review-decision';
import { ReviewNotes } from '@/features/sign-off/components/review-notes';
import { EnvelopePicker } from '@/features/envelopes/components/envelope-picker';

// Below the editor and needed later than it: loaded after the form and results are on screen.
const FillLogsPanel = lazy(() =>
  import('@/features/fill-logs/components/fill-logs-panel').then((module) => ({
    default: module.FillLogsPanel,
  })),
);
const AttachmentsPanel = lazy(() =>
  import('@/features/attachments/components/attachments-panel').then((module) => ({
    default: module.AttachmentsPanel,
  })),
);

export function CalculationEditorRoute() {
  const { id = '' } = useParams();
  const { user } = useMe();
  const { message } = App.useApp();
  const calculation = useCalculation(id);
  const comments = useReviewComments(id);
  const latest = calculation.data?.latest;
  // Open comments on inputs, shown under the field they are about.
  const remarks = useMemo(() => {
    const byPath: Record<string, string[]> = {};
    for (const comment of comments.data ?? []) {
      if (comment.addressed || comment.anchor?.kind !== 'input') continue;
      (byPath[comment.anchor.path] ??= []).push(
        `${comment.author?.displayName ?? 'A reviewer'} (version ${comment.versionNumber}): “${comment.body}”`,
      );
    }
    return byPath;
  }, [comments.data]);
  // What this user may do comes with the calculation and each file: the API owns the rules.
  const mayReview = Boolean(latest && calculation.data?.permissions.review);
  const mayWrite = Boolean(calculation.data?.permissions.upload);
  const mayRemove = (file: Attachment) => file.permissions.remove;
  // The library's envelopes fill inputs where the kind takes one and the reader has the library.
  const kind = calculation.data?.kind ?? '';
  const envelopePicker =
    user?.permissions.seeEnvelopes && kindCapabilities(kind).libraryEnvelope
      ? (value: unknown, onChange: (value: unknown) => void) => (
          <EnvelopePicker kindId={kind} value={value} onChange={onChange} />
        )
      : undefined;
  return (
    <>
      {mayReview && latest ? (
        <ReviewDecision
          calculationId={id}
          number={latest.number}
          kind={calculation.data?.kind ?? ''}
          inputs={latest.inputs}
          outputs={latest.outputs}
          unitSystem={user?.unitSystem ?? 'si'}
        />
      ) : null}
      {calculation.data ? (
        <ReviewCommentsPanel
          calculationId={id}
          latestVersion={calculation.data.latestVersion}
          canMarkAddressed={calculation.data.permissions.edit}
        />
      ) : null}
      {calculation.data ? (
        <section aria-label="What reviewers said">
          {/* The newest reviewed versions' decisions and comments, newest first. */}
          {calculation.data.versions
            .filter(
              (version) => version.status === 'approved' || version.status === 'changes_requested',
            )
            .slice(-2)
            .reverse()
            .map((version) => (
              <ReviewNotes key={version.number} calculationId={id} number={version.number} />
            ))}
        </section>
      ) : null}
      <FieldRemarksContext.Provider value={remarks}>
        <CalculationEditor
          key={id}
          id={id}
          unitSystem={user?.unitSystem ?? 'si'}
          picker={envelopePicker}
        />
      </FieldRemarksContext.Provider>
      {calculation.data && user ? (
        <Suspense fallback={null}>
          <PanelBoundary what="the fill logs">
            <FillLogsPanel
              calculationId={id}
              latestVersion={calculation.data.latestVersion}
              predicts={kindCapabilities(calculation.data.kind).predictsFillLift}
              canEdit={mayWrite}
              unitSystem={user.unitSystem}
              filesFor={(log) => (
                <AttachmentsPanel
                  calculationId={id}
                  fillLogId={log.id}
                  title="Files of this fill"
                  canUpload={mayWrite}
                  canRemove={mayRemove}
                />
              )}
            />
          </PanelBoundary>
          <PanelBoundary what="the files">
            <AttachmentsPanel calculationId={id} canUpload={mayWrite} canRemove={mayRemove} />
          </PanelBoundary>
        </Suspense>
      ) : null}
      {calculation.data ? (
        <section aria-label="Versions" style={{ marginTop: 24 }}>
          <Space style={{ width: '100%', justifyContent: 'space-between' }}>
            <Typography.Title level={4}>Versions</Typography.Title>
            <Button
              onClick={() =>
                void downloadCalculationFile(id).catch(
                  (error: Error) => void message.error(error.message),
                )
              }
            >
              Export file
            </Button>
          </Space>
          <VersionHistory
            versions={calculation.data.versions}
            sheetHref={(n) => paths.sheet.href(id, n)}
          />
          <Typography.Title level={4} style={{ marginTop: 24 }}>
            Compare versions
          </Typography.Title>
          <VersionCompare
            calculationId={id}
            kind={calculation.data.kind}
            versions={calculation.data.versions}
            unitSystem={user?.unitSystem ?? 'si'}
          />
        </section>
      ) : null}
    </>
  );
}
