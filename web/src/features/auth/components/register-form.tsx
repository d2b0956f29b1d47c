import { Button, Form, Input } from 'antd';
import { FormError } from '@/components/errors/form-error';
import { guessNumberFormat } from '@/lib/guess-number-format';
import { type RegisterBody, type RegisterOutcome, useRegister } from '../api/auth-api';

export function RegisterForm({
  onRegistered,
  joinCode,
}: {
  onRegistered: (outcome: RegisterOutcome) => void;
  /** Registering from a class's join link: a student account, joined to that class. */
  joinCode?: string;
}) {
  const register = useRegister();
  return (
    <Form
      layout="vertical"
      requiredMark={false}
      onFinish={(values: Pick<RegisterBody, 'email' | 'password' | 'displayName'>) =>
        register.mutate(
          // How numbers are written is guessed from the browser; the user menu changes it later.
          { ...values, numberFormat: guessNumberFormat(), ...(joinCode ? { joinCode } : {}) },
          { onSuccess: onRegistered },
        )
      }
    >
      <FormError error={register.error} />
      <Form.Item
        label="Name"
        name="displayName"
        rules={[{ required: true, message: 'Enter the name others will see.' }]}
      >
        <Input autoComplete="name" maxLength={80} />
      </Form.Item>
      <Form.Item
        label="E-mail"
        name="email"
        rules={[{ required: true, type: 'email', message: 'Enter an e-mail address.' }]}
      >
        <Input type="email" autoComplete="username" />
      </Form.Item>
      <Form.Item
        label="Password"
        name="password"
        extra="At least 10 characters."
        rules={[{ required: true, min: 10, message: 'Use at least 10 characters.' }]}
      >
        <Input.Password autoComplete="new-password" />
      </Form.Item>
      <Button type="primary" htmlType="submit" loading={register.isPending} block>
        Create account
      </Button>
    </Form>
  );
}
