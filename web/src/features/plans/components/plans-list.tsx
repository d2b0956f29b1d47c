import { App, Button, Popconfirm, Space, Table, Typography } from 'antd';
import { Link } from 'react-router-dom';
import { useReadingPreferences } from '@/components/reading/reading-preferences';
import { NEW_PLAN, type Plan, usePlans, useRemovePlan, useSavePlan } from '../api/plans-api';

/** The user's gas plans, newest first, with a button to start one. */
export function PlansList({
  planHref,
  onCreated,
}: {
  planHref: (id: string) => string;
  onCreated: (id: string) => void;
}) {
  const { message } = App.useApp();
  const plans = usePlans();
  const create = useSavePlan();
  const remove = useRemovePlan();
  // A new plan's prices are in the currency the account names.
  const { currency } = useReadingPreferences();
  return (
    <>
      <Space style={{ marginBottom: 12 }}>
        <Button
          type="primary"
          loading={create.isPending}
          onClick={() =>
            create.mutate(
              { ...NEW_PLAN, prices: { currency } },
              {
                onSuccess: (plan) => onCreated(plan.id),
                onError: (error) => void message.error(error.message),
              },
            )
          }
        >
          New gas plan
        </Button>
      </Space>
      <Table<Plan>
        rowKey="id"
        size="middle"
        aria-label="Gas plans"
        loading={plans.isPending}
        dataSource={plans.data ?? []}
        locale={{ emptyText: 'No plans yet' }}
        columns={[
          {
            title: 'Plan',
            dataIndex: 'title',
            render: (title: string, plan) => <Link to={planHref(plan.id)}>{title}</Link>,
          },
          { title: 'Event', dataIndex: 'eventDate', render: (date: string) => date || '—' },
          {
            title: 'Envelopes',
            key: 'envelopes',
            render: (_: unknown, plan) =>
              plan.result.lines.reduce((sum, line) => sum + line.count, 0),
          },
          {
            title: 'Gas in all',
            key: 'total',
            render: (_: unknown, plan) => (
              <Typography.Text className="lw-mono">
                {plan.result.totalM3.toPrecision(4)} m³
              </Typography.Text>
            ),
          },
          {
            title: 'Updated',
            dataIndex: 'updatedAt',
            render: (at: string) => new Date(at).toLocaleString(),
          },
          {
            title: 'Actions',
            key: 'actions',
            render: (_: unknown, plan) => (
              <Popconfirm
                title={`Remove “${plan.title}”?`}
                okText="Remove"
                cancelText="Keep"
                onConfirm={() => remove.mutateAsync(plan.id)}
              >
                <Button type="link" danger size="small" aria-label={`Remove ${plan.title}`}>
                  Remove
                </Button>
              </Popconfirm>
            ),
          },
        ]}
      />
    </>
  );
}
