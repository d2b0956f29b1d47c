import { Select } from 'antd';
import type { NumberFormat } from '@loftwright/buoyancy';
import { CURRENCIES } from '@/config/currencies';
import { type CurrentUser, useSetPreferences } from '../api/auth-api';

/** Each format shown as the number it writes; a no-break space keeps 1 234,5 on one line. */
const NUMBER_FORMAT_OPTIONS: { label: string; value: NumberFormat }[] = [
  { label: '1,234.5', value: 'point-comma' },
  { label: '1\u00a0234,5', value: 'comma-space' },
  { label: '1.234,5', value: 'comma-point' },
];

/** The number format and currency kept on the account, each saved as soon as it is picked. */
export function PreferenceSelects({ user }: { user: CurrentUser }) {
  const setPreferences = useSetPreferences();
  const currencies = CURRENCIES.includes(user.currency)
    ? CURRENCIES
    : [user.currency, ...CURRENCIES];
  return (
    <>
      <Select
        aria-label="Number format"
        size="small"
        style={{ width: '100%' }}
        value={user.numberFormat}
        options={NUMBER_FORMAT_OPTIONS}
        onChange={(numberFormat: NumberFormat) => setPreferences.mutate({ numberFormat })}
      />
      <Select
        aria-label="Currency"
        size="small"
        style={{ width: '100%' }}
        value={user.currency}
        options={currencies.map((code) => ({ label: code, value: code }))}
        onChange={(currency: string) => setPreferences.mutate({ currency })}
      />
    </>
  );
}
