import { Alert, Button, Card, Form, Input, Typography } from 'antd';

/** The sign-in form, not yet connected to the API: it says so instead of submitting. */
export function SignInRoute() {
  return (
    <Card style={{ maxWidth: 420 }}>
      <Typography.Title level={2}>Sign in</Typography.Title>
      <Alert
        type="info"
        showIcon
        title="Signing in from this page is not ready yet"
        description="Accounts exist on the server (the README lists the demo accounts) and the API signs them in at /api/auth/login; this page will follow."
        style={{ marginBottom: 16 }}
      />
      <Form layout="vertical" disabled requiredMark={false}>
        <Form.Item label="E-mail" name="email" htmlFor="sign-in-email">
          <Input id="sign-in-email" type="email" autoComplete="username" />
        </Form.Item>
        <Form.Item label="Password" name="password" htmlFor="sign-in-password">
          <Input.Password id="sign-in-password" autoComplete="current-password" />
        </Form.Item>
        <Button type="primary" htmlType="submit">
          Sign in
        </Button>
      </Form>
    </Card>
  );
}
