import { Layout, Typography } from 'antd';
import {
  AuditOutlined,
  DatabaseOutlined,
  ExperimentOutlined,
  FireOutlined,
  LoginOutlined,
  SettingOutlined,
  TableOutlined,
  TeamOutlined,
} from '@ant-design/icons';
import { Suspense, useMemo } from 'react';
import { Link, Outlet, useNavigate } from 'react-router-dom';
import { NavRail, type NavItem } from '@/components/layout/nav-rail';
import { PageLoading } from '@/components/layout/page-loading';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/auth-api';
import { UserMenu } from '@/features/auth/components/user-menu';
import { ReadingPreferencesContext } from '@/components/reading/reading-preferences';
import { guessNumberFormat } from '@/lib/guess-number-format';

/** Navigation rail on the left, the working area filling the rest. */
export function AppLayout() {
  const { signedIn, user } = useMe();
  const navigate = useNavigate();
  const numberFormat = user?.numberFormat;
  const currency = user?.currency;
  const reading = useMemo(
    () => ({ numberFormat: numberFormat ?? guessNumberFormat(), currency: currency ?? 'EUR' }),
    [numberFormat, currency],
  );
  const items: NavItem[] = [
    { href: paths.home.href(), icon: <ExperimentOutlined />, label: 'Workbench' },
    ...(signedIn
      ? [
          { href: paths.calculations.href(), icon: <TableOutlined />, label: 'Calculations' },
          ...(user?.permissions.planGas
            ? [{ href: paths.plans.href(), icon: <FireOutlined />, label: 'Gas plans' }]
            : []),
          ...(user?.permissions.seeEnvelopes
            ? [{ href: paths.envelopes.href(), icon: <DatabaseOutlined />, label: 'Envelopes' }]
            : []),
          ...(user?.permissions.seeClasses
            ? [{ href: paths.classes.href(), icon: <TeamOutlined />, label: 'Classes' }]
            : []),
          ...(user?.permissions.review
            ? [{ href: paths.reviews.href(), icon: <AuditOutlined />, label: 'Review queue' }]
            : []),
          ...(user?.permissions.administer
            ? [{ href: paths.admin.href(), icon: <SettingOutlined />, label: 'Admin' }]
            : []),
        ]
      : [{ href: paths.signIn.href(), icon: <LoginOutlined />, label: 'Sign in' }]),
  ];
  return (
    <Layout style={{ minHeight: '100vh' }}>
      <Layout.Sider width={200} breakpoint="md" collapsedWidth={64} theme="light">
        <div style={{ padding: '16px 20px' }}>
          <Link to={paths.home.href()} aria-label="Loftwright home">
            <Typography.Text strong style={{ fontSize: 18 }}>
              Loftwright
            </Typography.Text>
          </Link>
        </div>
        <NavRail items={items} />
        {signedIn ? <UserMenu onSignedOut={() => void navigate(paths.signIn.href())} /> : null}
      </Layout.Sider>
      <Layout.Content style={{ padding: 24 }}>
        <ReadingPreferencesContext.Provider value={reading}>
          <Suspense fallback={<PageLoading />}>
            <Outlet />
          </Suspense>
        </ReadingPreferencesContext.Provider>
      </Layout.Content>
    </Layout>
  );
}
