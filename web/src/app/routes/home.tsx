import { Col, Row, Typography } from 'antd';
import { AirDensityPreview } from '@/features/air-density/components/air-density-preview';
import { ServerStatus } from '@/features/health/components/server-status';

export function HomeRoute() {
  return (
    <>
      <Typography.Title level={1}>Workbench</Typography.Title>
      <Typography.Paragraph style={{ maxWidth: 720 }}>
        Size envelopes for a payload, check their lift under real conditions, have a reviewer sign
        off the exact version you fill from, and compare what the scale says afterwards.
      </Typography.Paragraph>
      <Row gutter={[24, 24]}>
        <Col xs={24} lg={14}>
          <AirDensityPreview />
        </Col>
        <Col xs={24} lg={10}>
          <ServerStatus />
        </Col>
      </Row>
    </>
  );
}
