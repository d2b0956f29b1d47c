import { Card, Typography } from 'antd';
import { Link, useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RegisterForm } from '@/features/auth/components/register-form';

export function RegisterRoute() {
  const navigate = useNavigate();
  return (
    <Card style={{ maxWidth: 420 }}>
      <Typography.Title level={2}>Create an account</Typography.Title>
      <RegisterForm
        onRegistered={() => void navigate(paths.calculations.href(), { replace: true })}
      />
      <Typography.Paragraph style={{ marginTop: 16 }}>
        Already have one? <Link to={paths.signIn.href()}>Sign in</Link>
      </Typography.Paragraph>
    </Card>
  );
}
