import { Spin } from 'antd';

export function PageLoading() {
  return (
    <div role="status" style={{ padding: 48, textAlign: 'center' }}>
      <Spin description="Loading…" />
    </div>
  );
}
