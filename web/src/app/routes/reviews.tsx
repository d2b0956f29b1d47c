import { Typography } from 'antd';
import { paths } from '@/config/paths';
import { ReviewQueue } from '@/features/reviews/components/review-queue';

export function ReviewsRoute() {
  return (
    <>
      <Typography.Title level={1}>Review queue</Typography.Title>
      <ReviewQueue calculationHref={paths.calculation.href} />
    </>
  );
}
