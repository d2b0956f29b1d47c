import { Button, Result } from 'antd';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

/** Shown in place of a page that failed to load or render, with the rest of the app intact. */
export function RouteError() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <Result
      status="error"
      title={<h1 style={{ font: 'inherit', margin: 0 }}>This page could not be shown</h1>}
      subTitle={detail}
      extra={
        <Button type="primary" onClick={() => window.location.reload()}>
          Reload the page
        </Button>
      }
    />
  );
}
