import { PlusOutlined } from '@ant-design/icons';
import { Button, Typography, theme } from 'antd';
import type { ReactNode } from 'react';
import { useRowKeys } from '../hooks/use-row-keys';
import { ArrayRow } from './array-row';

const NO_ITEMS: readonly unknown[] = [];

const capitalise = (text: string) => text.replace(/^./, (first) => first.toUpperCase());
const pluralOf = (noun: string) => (noun.endsWith('s') ? noun : `${noun}s`);

export interface ArrayRowsFieldProps {
  /** Id of the list's fieldset; the form's field id for this path. */
  id: string;
  /** Dotted path of the list; item `i` is at `${path}.${i}`. */
  path: string;
  /** The list's label, e.g. "Payload packages". */
  label: string;
  /** What one item is called, in lower case: "package" gives "Package 1" and "Add package". */
  itemLabel: string;
  value: unknown;
  onChange: (items: unknown[]) => void;
  /** A fresh item for "Add", filled with the item schema's defaults. */
  newItem: () => unknown;
  /** One item's fields; `onItemChange` replaces the item. */
  renderItem: (item: unknown, index: number, onItemChange: (next: unknown) => void) => ReactNode;
  minItems?: number;
  maxItems?: number;
  /** Messages by field path, from the engine's live check or the server. */
  errors: Record<string, string>;
  disabled?: boolean;
}

/**
 * A list of objects as rows: each item's fields in a numbered fieldset ("Package 1") with a
 * Remove button, and an Add button that appends a fresh item, within the schema's minItems and
 * maxItems.
 */
export function ArrayRowsField({
  id,
  path,
  label,
  itemLabel,
  value,
  onChange,
  newItem,
  renderItem,
  minItems = 0,
  maxItems,
  errors,
  disabled,
}: ArrayRowsFieldProps) {
  const { token } = theme.useToken();
  const items = Array.isArray(value) ? (value as readonly unknown[]) : NO_ITEMS;
  const rows = useRowKeys(items, onChange);
  const noun = capitalise(itemLabel);
  const full = maxItems !== undefined && items.length >= maxItems;
  const atLeast = items.length <= minItems;
  const listError = errors[path];

  return (
    <fieldset
      id={id}
      aria-describedby={listError ? `${id}-error` : undefined}
      style={{ border: 'none', padding: 0, margin: `0 0 ${token.marginLG}px` }}
    >
      <legend
        style={{
          color: token.colorTextHeading,
          fontSize: token.fontSize,
          padding: `0 0 ${token.paddingXS}px`,
          margin: 0,
          border: 'none',
        }}
      >
        {label}
      </legend>
      {items.length === 0 ? (
        <Typography.Paragraph type="secondary">No {pluralOf(itemLabel)} yet.</Typography.Paragraph>
      ) : null}
      {items.map((item, index) => (
        <ArrayRow
          key={rows.keys[index] ?? `extra-${index}`}
          legend={`${noun} ${index + 1}`}
          error={errors[`${path}.${index}`]}
          removeLabel={`Remove ${itemLabel} ${index + 1}`}
          removeTitle={
            atLeast
              ? `Needs at least ${minItems} ${minItems === 1 ? itemLabel : pluralOf(itemLabel)}`
              : undefined
          }
          removeDisabled={disabled || atLeast}
          onRemove={() => rows.remove(index)}
        >
          {renderItem(item, index, (next) => rows.change(index, next))}
        </ArrayRow>
      ))}
      {listError ? (
        <Typography.Paragraph id={`${id}-error`} type="danger">
          {listError}
        </Typography.Paragraph>
      ) : null}
      <Button
        type="dashed"
        block
        icon={<PlusOutlined aria-hidden />}
        disabled={disabled || full}
        onClick={() => rows.add(newItem())}
      >
        Add {itemLabel}
      </Button>
      {full ? (
        <Typography.Text type="secondary" style={{ fontSize: token.fontSizeSM }}>
          At most {maxItems} {pluralOf(itemLabel)}; remove one to add another.
        </Typography.Text>
      ) : null}
    </fieldset>
  );
}
