import { Card } from 'antd';
import type { ReactNode } from 'react';

/**
 * A chart in a card, with the text a screen reader reads instead of the picture. The height is
 * fixed so the page does not jump while the live results recompute.
 */
export function ChartFrame({
  title,
  description,
  children,
  testId,
}: {
  title: string;
  description: string;
  children: ReactNode;
  testId?: string;
}) {
  return (
    <Card title={title} size="small" style={{ marginTop: 16 }} data-chart={testId}>
      <div style={{ width: '100%', height: 260 }} role="img" aria-label={description}>
        {children}
      </div>
    </Card>
  );
}
