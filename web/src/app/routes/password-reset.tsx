import { Alert, Card, Typography } from 'antd';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import {
  ResetConfirmForm,
  ResetRequestForm,
} from '@/features/auth/components/password-reset-forms';

export function ForgotPasswordRoute() {
  return (
    <Card style={{ maxWidth: 420 }}>
      <Typography.Title level={2}>Reset your password</Typography.Title>
      <Typography.Paragraph>
        We will mail a link that works once, for 30 minutes.
      </Typography.Paragraph>
      <ResetRequestForm />
      <Typography.Paragraph style={{ marginTop: 16 }}>
        <Link to={paths.signIn.href()}>Back to sign in</Link>
      </Typography.Paragraph>
    </Card>
  );
}

export function ResetPasswordRoute() {
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const token = search.get('token');
  return (
    <Card style={{ maxWidth: 420 }}>
      <Typography.Title level={2}>Choose a new password</Typography.Title>
      {token ? (
        <ResetConfirmForm
          token={token}
          onDone={() => void navigate(paths.signIn.href(), { replace: true })}
        />
      ) : (
        <Alert type="error" showIcon title="This page needs the link from the reset mail." />
      )}
    </Card>
  );
}
