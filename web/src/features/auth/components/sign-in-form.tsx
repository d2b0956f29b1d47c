import { Button, Form, Input } from 'antd';
import { FormError } from '@/components/errors/form-error';
import { useSignIn } from '../api/auth-api';

/** E-mail and password; on success the session starts and `onSignedIn` runs. */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  return (
    <Form
      layout="vertical"
      requiredMark={false}
      onFinish={(values: { email: string; password: string }) =>
        signIn.mutate(values, { onSuccess: onSignedIn })
      }
    >
      <FormError error={signIn.error} />
      <Form.Item
        label="E-mail"
        name="email"
        rules={[{ required: true, message: 'Enter your e-mail address.' }]}
      >
        <Input type="email" autoComplete="username" />
      </Form.Item>
      <Form.Item
        label="Password"
        name="password"
        rules={[{ required: true, message: 'Enter your password.' }]}
      >
        <Input.Password autoComplete="current-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" loading={signIn.isPending} block>
        Sign in
      </Button>
    </Form>
  );
}
