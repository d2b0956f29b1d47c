import { Alert, Card, Descriptions, Skeleton, Tag } from 'antd';
import { ENGINE_VERSION } from '@loftwright/buoyancy';
import { useHealth } from '../api/get-health';

/** The server's own report: is the API up, is its database reachable, which engine it runs. */
export function ServerStatus() {
  const { data, error, isPending } = useHealth();

  if (isPending)
    return (
      <Card title="Server">
        <Skeleton active paragraph={{ rows: 2 }} />
      </Card>
    );
  if (error) {
    return (
      <Card title="Server">
        <Alert type="error" showIcon title="Server not reachable" description={error.message} />
      </Card>
    );
  }

  const engineMatches = data.engineVersion === ENGINE_VERSION;
  return (
    <Card title="Server">
      <Descriptions column={1} size="small">
        <Descriptions.Item label="Status">
          <Tag color={data.status === 'ok' ? 'success' : 'error'}>
            {data.status === 'ok' ? 'Running' : 'Not healthy'}
          </Tag>
        </Descriptions.Item>
        <Descriptions.Item label="Database">
          {data.database === 'ok' ? 'Connected' : 'Not reachable'}
        </Descriptions.Item>
        <Descriptions.Item label="API version">
          <span className="lw-mono">{data.version}</span>
        </Descriptions.Item>
        <Descriptions.Item label="Engine version">
          <span className="lw-mono">{data.engineVersion}</span>
          {engineMatches ? null : <span> (this page runs {ENGINE_VERSION}: reload to update)</span>}
        </Descriptions.Item>
      </Descriptions>
    </Card>
  );
}
