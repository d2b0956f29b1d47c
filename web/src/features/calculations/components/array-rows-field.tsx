import { DeleteOutlined, PlusOutlined } from '@ant-design/icons';
import { Button, Flex, Typography, theme } from 'antd';
import { type ReactNode, useState } from 'react';

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

interface Rows {
  /** The list these keys belong to. */
  items: readonly unknown[];
  /** One stable React key per item, so a row's inputs stay with its item when another goes. */
  keys: readonly number[];
  next: number;
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
  const [rows, setRows] = useState<Rows>(() => ({
    items,
    keys: items.map((_, index) => index),
    next: items.length,
  }));
  // A list from outside (a row's edit, another version taken, a reset): a row's edit keeps the
  // length and the keys; a list of another length gets new rows (adjusting state while rendering,
  // as React recommends, rather than in an effect).
  let keys = rows.keys;
  if (rows.items !== items) {
    const next =
      rows.keys.length === items.length
        ? { ...rows, items }
        : {
            items,
            keys: items.map((_, index) => rows.next + index),
            next: rows.next + items.length,
          };
    keys = next.keys;
    setRows(next);
  }

  const report = (nextItems: unknown[], nextKeys: readonly number[], next = rows.next) => {
    setRows({ items: nextItems, keys: nextKeys, next });
    onChange(nextItems);
  };
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
      {items.map((item, index) => {
        const itemError = errors[`${path}.${index}`];
        return (
          <fieldset
            key={keys[index] ?? `extra-${index}`}
            style={{
              border: `1px solid ${token.colorBorderSecondary}`,
              borderRadius: token.borderRadiusLG,
              padding: `0 ${token.paddingSM}px ${token.paddingSM}px`,
              margin: `0 0 ${token.marginSM}px`,
            }}
          >
            <legend
              style={{
                width: 'auto',
                fontSize: token.fontSize,
                fontWeight: token.fontWeightStrong,
                color: token.colorTextHeading,
                padding: `0 ${token.paddingXXS}px`,
                margin: 0,
                border: 'none',
              }}
            >
              {noun} {index + 1}
            </legend>
            {renderItem(item, index, (next) =>
              report(
                items.map((current, at) => (at === index ? next : current)),
                keys,
              ),
            )}
            {itemError ? (
              <Typography.Paragraph type="danger">{itemError}</Typography.Paragraph>
            ) : null}
            <Flex justify="flex-end">
              <Button
                size="small"
                type="text"
                danger
                icon={<DeleteOutlined aria-hidden />}
                aria-label={`Remove ${itemLabel} ${index + 1}`}
                title={
                  atLeast
                    ? `Needs at least ${minItems} ${minItems === 1 ? itemLabel : pluralOf(itemLabel)}`
                    : undefined
                }
                disabled={disabled || atLeast}
                onClick={() =>
                  report(
                    items.filter((_, at) => at !== index),
                    keys.filter((_, at) => at !== index),
                  )
                }
              >
                Remove
              </Button>
            </Flex>
          </fieldset>
        );
      })}
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
        onClick={() => report([...items, newItem()], [...keys, rows.next], rows.next + 1)}
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
