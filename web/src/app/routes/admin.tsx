import { Result, Tabs, Typography } from 'antd';
import { useMe } from '@/features/auth/api/auth-api';
import { AuditTable } from '@/features/admin/components/audit-table';
import { OutboxList } from '@/features/admin/components/outbox-list';
import { UsersTable } from '@/features/admin/components/users-table';

export function AdminRoute() {
  const { user } = useMe();
  if (!user?.permissions.administer) {
    return (
      <Result
        status="403"
        title={<h1 style={{ font: 'inherit', margin: 0 }}>This page is for admins</h1>}
        subTitle="Ask an admin if you need users, roles, the audit trail or the mail outbox."
      />
    );
  }
  return (
    <>
      <Typography.Title level={1}>Admin</Typography.Title>
      <Tabs
        items={[
          { key: 'users', label: 'Users and roles', children: <UsersTable /> },
          { key: 'audit', label: 'Audit trail', children: <AuditTable /> },
          { key: 'outbox', label: 'Mail outbox', children: <OutboxList /> },
        ]}
      />
    </>
  );
}
