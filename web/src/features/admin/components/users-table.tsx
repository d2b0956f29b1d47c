import { App, Select, Table } from 'antd';
import { type AdminUser, type Role, ROLES, useUpdateRoles, useUsers } from '../api/admin-api';

/** Every account with its roles; an admin changes them in place (the user signs in again). */
export function UsersTable() {
  const { message } = App.useApp();
  const users = useUsers();
  const update = useUpdateRoles();
  return (
    <Table<AdminUser>
      rowKey="id"
      size="middle"
      loading={users.isPending}
      dataSource={users.data ?? []}
      pagination={{ pageSize: 20 }}
      columns={[
        { title: 'Name', dataIndex: 'displayName' },
        { title: 'E-mail', dataIndex: 'email' },
        {
          title: 'Roles',
          dataIndex: 'roles',
          render: (roles: Role[], user) => (
            <Select
              mode="multiple"
              aria-label={`Roles of ${user.displayName}`}
              value={roles}
              style={{ minWidth: 260 }}
              options={ROLES.map((role) => ({ value: role, label: role }))}
              onChange={(next: Role[]) =>
                update.mutate(
                  { id: user.id, roles: next },
                  {
                    onSuccess: () => void message.success(`Roles of ${user.displayName} changed.`),
                    onError: (error) => void message.error(error.message),
                  },
                )
              }
            />
          ),
        },
        {
          title: 'Since',
          dataIndex: 'createdAt',
          render: (at: string) => new Date(at).toLocaleDateString(),
        },
      ]}
    />
  );
}
