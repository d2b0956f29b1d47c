import { Card, Typography } from 'antd';
import { useNavigate, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { VerifyForm } from '@/features/sign-off/components/verify-form';
import { VerifyResult } from '@/features/sign-off/components/verify-result';

/** Public: anyone holding a fingerprint (from a printed sheet, say) can check it here. */
export function VerifyRoute() {
  const { fingerprint } = useParams();
  const navigate = useNavigate();
  return (
    <Card style={{ maxWidth: 720 }}>
      <Typography.Title level={1}>Verify a sign-off</Typography.Title>
      <VerifyForm
        key={fingerprint ?? ''}
        initial={fingerprint}
        onFingerprint={(read) => void navigate(paths.verify.href(read))}
      />
      {fingerprint ? (
        <section aria-label="Verification" style={{ marginTop: 24 }}>
          <Typography.Paragraph className="lw-mono" style={{ wordBreak: 'break-all' }}>
            {fingerprint}
          </Typography.Paragraph>
          <VerifyResult fingerprint={fingerprint} />
        </section>
      ) : null}
    </Card>
  );
}
