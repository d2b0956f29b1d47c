import { Select } from 'antd';
import type { NumberFormat } from '@loftwright/buoyancy';
import { NUMBER_FORMAT_OPTIONS } from '@/components/reading/number-format-options';
import { CURRENCIES } from '@/config/currencies';
import { type Account, useSetPreferences } from '../api/auth-api';

/** The number format and currency kept on the account, each saved as soon as it is picked. */
export function PreferenceSelects({ user }: { user: Account }) {
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
