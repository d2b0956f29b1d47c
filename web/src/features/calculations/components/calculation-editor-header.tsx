import { Alert, Space, Typography } from 'antd';
import type { ReactNode } from 'react';
import { localMoment } from '@/lib/local-moment';
import type { CalculationDetail } from '../api/calculations-api';
import { StatusTag } from './status-tag';

/**
 * The calculation's title, version and status above its editor, with what the reader should know
 * first: an approved version is locked, versions are in review, the browser computes otherwise.
 */
export function CalculationEditorHeader({
  detail,
  serverDiffers,
  actions,
}: {
  detail: CalculationDetail;
  /** Whether the saved version's numbers differ from what this browser computes for them. */
  serverDiffers: boolean;
  /** Buttons beside the title ("Continue as …"). */
  actions?: ReactNode;
}) {
  return (
    <>
      <Space align="center" wrap style={{ marginBottom: 8 }}>
        <Typography.Title level={2} style={{ margin: 0 }}>
          {detail.title}
        </Typography.Title>
        <Typography.Text className="lw-mono">v{detail.latestVersion}</Typography.Text>
        <StatusTag status={detail.status} />
        {actions}
      </Space>
      {detail.status === 'approved' ? (
        <Alert
          type="success"
          showIcon
          title={`Version ${detail.latestVersion} is approved and locked.`}
          description="Saving a change makes a new draft version; the approved one stays as it is."
          style={{ marginBottom: 12 }}
        />
      ) : null}
      {detail.versions
        .filter((version) => version.status === 'in_review')
        .map((version) => (
          <Alert
            key={version.number}
            type="info"
            showIcon
            role="status"
            title={`Version ${version.number} is in review with ${version.reviewer?.displayName ?? 'any reviewer'}.`}
            description={
              version.submittedAt ? `Submitted ${localMoment(version.submittedAt)}.` : undefined
            }
            style={{ marginBottom: 12 }}
          />
        ))}
      {serverDiffers ? (
        <Alert
          type="warning"
          showIcon
          title="The saved version's numbers differ from what this browser computes"
          description="The server's recomputed results are the ones stored; reload to get the engine the server runs."
          style={{ marginBottom: 12 }}
        />
      ) : null}
    </>
  );
}
