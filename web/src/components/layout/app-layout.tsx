import { Layout, Typography } from 'antd';
import { Suspense } from 'react';
import { Link, Outlet } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PageLoading } from './page-loading';
import { NavRail } from './nav-rail';

/** Navigation rail on the left, the working area filling the rest. */
export function AppLayout() {
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
        <NavRail />
      </Layout.Sider>
      <Layout.Content style={{ padding: 24 }}>
        <>
          <Suspense fallback={<PageLoading />}>
            <Outlet />
          </Suspense>
        </>
      </Layout.Content>
    </Layout>
  );
}
