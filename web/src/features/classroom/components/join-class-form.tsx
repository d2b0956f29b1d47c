import { Button, Form, Input } from 'antd';
import { useState } from 'react';
import type { ApiError } from '@/lib/api-client';
import { useJoinClass } from '../api/classroom-api';

/** A student types the code the teacher handed out; the answer says what is wrong with it. */
export function JoinClassForm({
  initialCode = '',
  onJoined,
}: {
  initialCode?: string;
  onJoined: (classId: string) => void;
}) {
  const join = useJoinClass();
  const [code, setCode] = useState(initialCode);
  const error = join.error as ApiError | null;
  return (
    <Form
      layout="inline"
      aria-label="Join a class with its code"
      onFinish={() => join.mutate(code, { onSuccess: (joined) => onJoined(joined.id) })}
    >
      <Form.Item
        label="Join code"
        htmlFor="join-code"
        validateStatus={error ? 'error' : undefined}
        help={error ? <span role="alert">{error.message}</span> : undefined}
      >
        <Input
          id="join-code"
          className="lw-mono"
          placeholder="ABCD-EFGH"
          autoComplete="off"
          value={code}
          maxLength={40}
          style={{ width: 180, textTransform: 'uppercase' }}
          onChange={(event) => setCode(event.target.value)}
        />
      </Form.Item>
      <Button type="primary" htmlType="submit" loading={join.isPending} disabled={!code.trim()}>
        Join class
      </Button>
    </Form>
  );
}
