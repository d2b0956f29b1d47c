import { Alert, Card, Result, Typography } from 'antd';
import { useState } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RegisterForm } from '@/features/auth/components/register-form';

export function RegisterRoute() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const joinCode = search.get('join')?.trim() || undefined;
  const [mailedMessage, setMailedMessage] = useState<string>();
  if (mailedMessage) {
    return (
      <Card style={{ maxWidth: 420 }}>
        <Result
          status="info"
          title="Check your mail"
          subTitle={mailedMessage}
          extra={<Link to={paths.signIn.href()}>Go to sign in</Link>}
        />
      </Card>
    );
  }
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
        onRegistered={(outcome) =>
          outcome.status === 'check-mail'
            ? setMailedMessage(outcome.message)
            : void navigate(joinCode ? paths.classes.href() : paths.calculations.href(), {
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
