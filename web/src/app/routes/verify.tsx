import { Card, Typography } from 'antd';
import { useParams } from 'react-router-dom';
import { VerifyResult } from '@/features/sign-off/components/verify-result';

/** Public: anyone holding a fingerprint (from a printed sheet, say) can check it here. */
export function VerifyRoute() {
  const { fingerprint = '' } = useParams();
  return (
    <Card style={{ maxWidth: 720 }}>
      <Typography.Title level={2}>Verify a sign-off</Typography.Title>
      <Typography.Paragraph className="lw-mono" style={{ wordBreak: 'break-all' }}>
        {fingerprint}
      </Typography.Paragraph>
      <VerifyResult fingerprint={fingerprint} />
    </Card>
  );
}
