import { kindCapabilities } from '@loftwright/buoyancy';
import { Alert, Card, Space, Spin, Typography } from 'antd';
import { FLIGHT_EXPORT_FILES, type FlightExportFile } from '@loftwright/contract';
import { Link, useParams } from 'react-router-dom';
import { FileDownloads } from '@/components/export/file-downloads';
import { paths } from '@/config/paths';
import { useCalculation } from '@/features/calculations/api/calculations-api';
import { StatusTag } from '@/features/calculations/components/status-tag';
import { ReviewNotes } from '@/features/sign-off/components/review-notes';

/**
 * One version, where the review mails point: its status, what reviewers said of it, and the
 * ways on to the calculation and the version's sign-off sheet.
 */
export function VersionRoute() {
  const { id = '', n = '' } = useParams();
  const number = Number(n);
  const calculation = useCalculation(id);
  if (calculation.isPending) return <Spin />;
  if (calculation.error) return <Alert type="error" showIcon title={calculation.error.message} />;
  const version = calculation.data.versions.find((candidate) => candidate.number === number);
  if (!version) {
    return (
      <Alert
        type="warning"
        showIcon
        title={`${calculation.data.title} has no version ${n}.`}
        description={<Link to={paths.calculation.href(id)}>Open the calculation</Link>}
      />
    );
  }
  return (
    <Card style={{ maxWidth: 840 }}>
      <Typography.Title level={1}>
        {calculation.data.title}, version {version.number}
      </Typography.Title>
      <Space wrap style={{ marginBottom: 12 }}>
        <StatusTag status={version.status} />
        <Typography.Text>
          by {version.author?.displayName ?? 'unknown'}
          {version.note ? ` — ${version.note}` : ''}
        </Typography.Text>
      </Space>
      {version.status === 'in_review' ? (
        <Alert
          type="info"
          showIcon
          style={{ marginBottom: 12 }}
          title={`In review with ${version.reviewer?.displayName ?? 'any reviewer'}.`}
        />
      ) : null}
      <ReviewNotes calculationId={id} number={version.number} />
      <Space wrap>
        <Link to={paths.calculation.href(id)}>
          {version.number === calculation.data.latestVersion
            ? 'Open the calculation'
            : `Open the calculation (its latest version is ${calculation.data.latestVersion})`}
        </Link>
        <Link to={paths.sheet.href(id, version.number)}>
          Sign-off sheet of version {version.number}
        </Link>
        {kindCapabilities(calculation.data.kind).fillCard ? (
          <Link to={paths.fillCard.href(id, version.number)}>
            Fill card of version {version.number}
          </Link>
        ) : null}
      </Space>
      {kindCapabilities(calculation.data.kind).landingArea ? (
        <section aria-labelledby="flight-downloads" style={{ marginTop: 16 }}>
          <Typography.Title level={2} id="flight-downloads">
            Track and profile for map programs
          </Typography.Title>
          <Typography.Paragraph type="secondary">
            Computed on the server from this version: the ground track with launch, burst, landing
            and the 50 % and 95 % landing areas, and the vertical profile as a table.
          </Typography.Paragraph>
          <FileDownloads
            label={`Downloads of version ${version.number}`}
            files={FLIGHT_EXPORT_FILES.map((file) => ({
              path: `/calculations/${id}/versions/${version.number}/exports/${file}`,
              label: FLIGHT_EXPORT_LABELS[file],
              fallbackName: file,
            }))}
          />
        </section>
      ) : null}
    </Card>
  );
}

const FLIGHT_EXPORT_LABELS: Record<FlightExportFile, string> = {
  'track.geojson': 'Track as GeoJSON',
  'track.kml': 'Track as KML',
  'track.gpx': 'Track as GPX',
  'profile.csv': 'Profile as CSV',
};
