import { Button, Result } from 'antd';
import { Link, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';

export function NotFoundRoute() {
  const location = useLocation();
  return (
    <Result
      status="404"
      title={<h1 style={{ font: 'inherit', margin: 0 }}>Page not found</h1>}
      subTitle={
        <>
          Nothing lives at <span className="lw-mono">{location.pathname}</span>.
        </>
      }
      extra={
        <Link to={paths.home.href()}>
          <Button type="primary">Back to the workbench</Button>
        </Link>
      }
    />
  );
}
