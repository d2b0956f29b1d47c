import { Alert, Button, Card, Form, Input, Typography } from 'antd';

/** The sign-in form. Accounts are not served yet, so it explains that instead of submitting. */
export function SignInRoute() {
  return (
    <Card style={{ maxWidth: 420 }}>
      <Typography.Title level={2}>Sign in</Typography.Title>
      <Alert
        type="info"
        showIcon
        title="Accounts are not set up on this server yet"
        description="You can use the workbench without signing in until accounts arrive."
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
