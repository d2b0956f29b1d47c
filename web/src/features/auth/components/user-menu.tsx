import { Button, Segmented, Space, Typography } from 'antd';
import { lazy, Suspense } from 'react';
import { useMe, useSetPreferences, useSignOut } from '../api/auth-api';

// The menu sits in the layout every page loads; antd's Select would add about 24 kB gzip to the
// first page, over its budget (web/scripts/route-js-size.mjs), so it comes a moment later.
const PreferenceSelects = lazy(() =>
  import('./preference-selects').then((module) => ({ default: module.PreferenceSelects })),
);

/** Who is signed in, their preferences (kept on the account) and sign-out. */
export function UserMenu({ onSignedOut }: { onSignedOut: () => void }) {
  const { user } = useMe();
  const setPreferences = useSetPreferences();
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
        onChange={(value) => setPreferences.mutate({ unitSystem: value as 'si' | 'us' })}
      />
      <Suspense fallback={null}>
        <PreferenceSelects user={user} />
      </Suspense>
      <Button size="small" onClick={() => signOut.mutate(undefined, { onSettled: onSignedOut })}>
        Sign out
      </Button>
    </Space>
  );
}
