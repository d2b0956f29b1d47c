import { Button, Segmented, Space, Typography } from 'antd';
import { useMe, useSetUnitSystem, useSignOut } from '../api/auth-api';

/** Who is signed in, their unit system (kept on the account) and sign-out. */
export function UserMenu({ onSignedOut }: { onSignedOut: () => void }) {
  const { user } = useMe();
  const setUnitSystem = useSetUnitSystem();
  const signOut = useSignOut();
  if (!user) return null;
  return (
    <Space orientation="vertical" size="small" style={{ padding: '12px 20px', width: '100%' }}>
      <Typography.Text strong>{user.displayName}</Typography.Text>
      <Typography.Text type="secondary">{user.roles.join(', ')}</Typography.Text>
      <Segmented
        aria-label="Unit system"
        size="small"
        value={user.unitSystem}
        options={[
          { label: 'SI', value: 'si' },
          { label: 'US', value: 'us' },
        ]}
        onChange={(value) => setUnitSystem.mutate(value as 'si' | 'us')}
      />
      <Button size="small" onClick={() => signOut.mutate(undefined, { onSettled: onSignedOut })}>
        Sign out
      </Button>
    </Space>
  );
}
