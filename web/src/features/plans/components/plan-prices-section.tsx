import { Form, Input, Select, Space, Typography } from 'antd';
import { useId } from 'react';
import { MoneyInput } from '@/components/quantity/money-input';
import { CURRENCIES } from '@/config/currencies';
import type { PlanDraftEditor } from '../hooks/use-plan-draft';

/** Each price of the plan: its key, label, what it is per, and the most it may be. */
const PRICE_FIELDS = [
  ['electricityPerKWh', 'Electricity price', 'kWh', 100],
  ['cylinderEach', 'One full cylinder', undefined, 1e6],
  ['bulkGasPerM3', 'Delivered gas, per normal m³', 'm³', 1e5],
] as const;

/** The currency, the date the prices were quoted on, and the price of each source. */
export function PlanPricesSection({ editor }: { editor: PlanDraftEditor }) {
  const id = useId();
  const { draft, set } = editor;
  const currency = draft.prices?.currency ?? '';
  return (
    <>
      <Typography.Title level={5}>Prices</Typography.Title>
      <Space wrap align="start">
        <Form.Item label="Currency" htmlFor={`${id}-currency`}>
          <Select
            id={`${id}-currency`}
            value={currency || undefined}
            style={{ width: 110 }}
            options={(CURRENCIES.includes(currency) || !currency
              ? CURRENCIES
              : [currency, ...CURRENCIES]
            ).map((code) => ({ value: code, label: code }))}
            onChange={(code: string) => set({ prices: { ...draft.prices, currency: code } })}
          />
        </Form.Item>
        <Form.Item label="Quoted on" htmlFor={`${id}-prices-date`}>
          <Input
            id={`${id}-prices-date`}
            type="date"
            value={draft.pricesDate ?? ''}
            onChange={(event) => set({ pricesDate: event.target.value || undefined })}
          />
        </Form.Item>
        {PRICE_FIELDS.map(([key, label, per, max]) => (
          <Form.Item key={key} label={`${label} (${currency}${per ? `/${per}` : ''})`}>
            <MoneyInput
              label={label}
              currency={currency}
              per={per}
              max={max}
              value={draft.prices?.[key]}
              onChange={(value) => set({ prices: { currency, ...draft.prices, [key]: value } })}
            />
          </Form.Item>
        ))}
      </Space>
    </>
  );
}
