import { Alert, Button, Form, Input } from 'antd';
import { FormError } from '@/components/errors/form-error';
import { useConfirmReset, useRequestReset } from '../api/auth-api';

export function ResetRequestForm() {
  const request = useRequestReset();
  if (request.data)
    return <Alert type="success" showIcon title={request.data.message} role="status" />;
  return (
    <Form
      layout="vertical"
      requiredMark={false}
      onFinish={(values: { email: string }) => request.mutate(values)}
    >
      <FormError error={request.error} />
      <Form.Item
        label="E-mail"
        name="email"
        rules={[{ required: true, type: 'email', message: 'Enter the address of your account.' }]}
      >
        <Input type="email" autoComplete="username" />
      </Form.Item>
      <Button type="primary" htmlType="submit" loading={request.isPending} block>
        Send a reset link
      </Button>
    </Form>
  );
}

export function ResetConfirmForm({ token, onDone }: { token: string; onDone: () => void }) {
  const confirm = useConfirmReset();
  return (
    <Form
      layout="vertical"
      requiredMark={false}
      onFinish={(values: { password: string }) =>
        confirm.mutate({ token, password: values.password }, { onSuccess: onDone })
      }
    >
      <FormError error={confirm.error} />
      <Form.Item
        label="New password"
        name="password"
        extra="At least 10 characters."
        rules={[{ required: true, min: 10, message: 'Use at least 10 characters.' }]}
      >
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" loading={confirm.isPending} block>
        Set the new password
      </Button>
    </Form>
  );
}
