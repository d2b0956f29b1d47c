import { useState } from 'react';

interface Rows {
  /** The list these keys belong to. */
  items: readonly unknown[];
  /** One stable React key per item, so a row's inputs stay with its item when another goes. */
  keys: readonly number[];
  next: number;
}

/**
 * Stable React keys for the items of a list edited as rows, and the edits that keep them: a
 * changed item keeps its key, a removed one takes its key along, an added one gets a new key.
 * Each edit reports the new list through `onChange`.
 */
export function useRowKeys(items: readonly unknown[], onChange: (items: unknown[]) => void) {
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
  return {
    keys,
    change: (index: number, item: unknown) =>
      report(
        items.map((current, at) => (at === index ? item : current)),
        keys,
      ),
    remove: (index: number) =>
      report(
        items.filter((_, at) => at !== index),
        keys.filter((_, at) => at !== index),
      ),
    add: (item: unknown) => report([...items, item], [...keys, rows.next], rows.next + 1),
  };
}
