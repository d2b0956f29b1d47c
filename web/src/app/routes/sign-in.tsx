import { Card, Space, Typography } from 'antd';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { SignInForm } from '@/features/auth/components/sign-in-form';

export function SignInRoute() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const next = search.get('next');
  // Only return to a path of this site.
  const target =
    next && next.startsWith('/') && !next.startsWith('//') ? next : paths.calculations.href();
  return (
    <Card style={{ maxWidth: 420 }}>
      <Typography.Title level={2}>Sign in</Typography.Title>
      <SignInForm onSignedIn={() => void navigate(target, { replace: true })} />
      <Space style={{ marginTop: 16 }} wrap>
        <Link to={paths.register.href()}>Create an account</Link>
        <Link to={paths.forgotPassword.href()}>Forgot the password?</Link>
        <Link to={paths.verify.href()}>Verify a sign-off sheet</Link>
      </Space>
    </Card>
  );
}
