import { Spin } from 'antd';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/auth-api';

/** Pages below it need a signed-in user; others are sent to sign in and brought back after. */
export function RequireSignIn() {
  const location = useLocation();
  const { signedIn, user, isPending } = useMe();
  if (!signedIn)
    return <Navigate to={paths.signIn.href(location.pathname + location.search)} replace />;
  if (isPending || !user) return <Spin description="Checking your session…" />;
  return <Outlet />;
}
