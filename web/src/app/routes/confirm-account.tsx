import { Alert, Card, Spin, Typography } from 'antd';
import { useEffect, useRef } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { FormError } from '@/components/errors/form-error';
import { paths } from '@/config/paths';
import { useConfirmRegistration } from '@/features/auth/api/auth-api';

/** Where the link mailed at registration lands: creates the account, signs in, moves on. */
export function ConfirmAccountRoute() {
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const token = search.get('token');
  const confirm = useConfirmRegistration();
  // The link works once: React may run an effect twice in development, the request goes once.
  const sent = useRef(false);
  useEffect(() => {
    if (!token || sent.current) return;
    sent.current = true;
    confirm.mutate(token, {
      onSuccess: ({ user }) =>
        void navigate(
          user.permissions.joinClasses ? paths.classes.href() : paths.calculations.href(),
          { replace: true },
        ),
    });
  }, [token, confirm, navigate]);
  return (
    <Card style={{ maxWidth: 420 }}>
      <Typography.Title level={1}>Finish creating your account</Typography.Title>
      {!token ? (
        <Alert type="error" showIcon title="This page needs the link from the registration mail." />
      ) : confirm.isError ? (
        <>
          <FormError error={confirm.error} />
          <Typography.Paragraph>
            <Link to={paths.register.href()}>Register again</Link> or{' '}
            <Link to={paths.signIn.href()}>sign in</Link>.
          </Typography.Paragraph>
        </>
      ) : (
        <Typography.Paragraph role="status">
          <Spin size="small" /> Creating the account…
        </Typography.Paragraph>
      )}
    </Card>
  );
}
