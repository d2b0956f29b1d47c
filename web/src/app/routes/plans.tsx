import { Alert, Spin, Typography } from 'antd';
import { useNavigate, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/auth-api';
import { usePlan } from '@/features/plans/api/plans-api';
import { PlanEditor } from '@/features/plans/components/plan-editor';
import { PlansList } from '@/features/plans/components/plans-list';

export function PlansRoute() {
  const navigate = useNavigate();
  return (
    <>
      <Typography.Title level={1}>Gas plans</Typography.Title>
      <Typography.Paragraph style={{ maxWidth: 760 }}>
        How much gas an event or a launch campaign needs, how long your electrolyser runs for it,
        how many cylinders it takes, and what each source costs. Prices are yours to enter, with the
        day they were quoted.
      </Typography.Paragraph>
      <PlansList
        planHref={paths.plan.href}
        onCreated={(id) => void navigate(paths.plan.href(id))}
      />
    </>
  );
}

export function PlanRoute() {
  const { id = '' } = useParams();
  const { user } = useMe();
  const plan = usePlan(id);
  if (plan.isPending) return <Spin description="Loading the plan…" />;
  if (plan.error) return <Alert type="warning" showIcon title={plan.error.message} />;
  return (
    <>
      <Typography.Title level={2}>{plan.data.title}</Typography.Title>
      <PlanEditor key={plan.data.id} plan={plan.data} unitSystem={user?.unitSystem ?? 'si'} />
    </>
  );
}
