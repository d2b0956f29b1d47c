import { Alert, Card, Typography } from 'antd';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RegisterForm } from '@/features/auth/components/register-form';

export function RegisterRoute() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const joinCode = search.get('join')?.trim() || undefined;
  return (
    <Card style={{ maxWidth: 420 }}>
      <Typography.Title level={2}>
        {joinCode ? 'Create a student account' : 'Create an account'}
      </Typography.Title>
      {joinCode ? (
        <Alert
          type="info"
          showIcon
          style={{ marginBottom: 16 }}
          title={
            <>
              You will join the class with the code{' '}
              <span className="lw-mono">{joinCode.toUpperCase()}</span>.
            </>
          }
        />
      ) : null}
      <RegisterForm
        joinCode={joinCode}
        onRegistered={() =>
          void navigate(joinCode ? paths.classes.href() : paths.calculations.href(), {
            replace: true,
          })
        }
      />
      <Typography.Paragraph style={{ marginTop: 16 }}>
        Already have one?{' '}
        <Link to={paths.signIn.href(joinCode ? paths.join.href(joinCode) : undefined)}>
          Sign in
        </Link>
      </Typography.Paragraph>
    </Card>
  );
}
