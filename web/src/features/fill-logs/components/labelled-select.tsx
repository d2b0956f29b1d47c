import { Form, Select } from 'antd';

/** A select under a form label, named for assistive technology by `name`. */
export function LabelledSelect<T extends string>({
  label,
  name,
  width,
  value,
  options,
  onChange,
  allowClear,
}: {
  label: string;
  name: string;
  width: number;
  value: T | undefined;
  options: { value: T; label: string }[];
  onChange: (value: T) => void;
  allowClear?: boolean;
}) {
  return (
    <Form.Item label={label}>
      <Select
        aria-label={name}
        allowClear={allowClear}
        style={{ width }}
        value={value}
        options={options}
        onChange={onChange}
      />
    </Form.Item>
  );
}
