import { Form, Select } from 'antd';
import type { NumberFormat } from '@loftwright/buoyancy';
import { NUMBER_FORMAT_OPTIONS } from '@/components/reading/number-format-options';

/**
 * How the file writes its numbers. It starts at the account's format but a logger's file often
 * writes otherwise, so it is asked, never guessed from the cells.
 */
export function CsvNumberFormatSelect({
  value,
  onChange,
}: {
  value: NumberFormat;
  onChange: (format: NumberFormat) => void;
}) {
  return (
    <Form.Item label="Numbers in the file">
      <Select
        aria-label="Numbers in the file"
        style={{ width: 120 }}
        value={value}
        options={NUMBER_FORMAT_OPTIONS}
        onChange={onChange}
      />
    </Form.Item>
  );
}
