import { useState } from 'react';
import type { SavePlanBody } from '../api/plans-api';

/**
 * The plan as edited, and the quantity fields whose text does not read: saving waits until they
 * do, so a value the user can see is wrong is never saved as the last one that read.
 */
export function usePlanDraft(saved: SavePlanBody) {
  const [draft, setDraft] = useState<SavePlanBody>(saved);
  const set = (change: Partial<SavePlanBody>) => setDraft((current) => ({ ...current, ...change }));
  const setLine = (index: number, change: Partial<SavePlanBody['lines'][number]>) =>
    set({
      lines: draft.lines.map((line, i) => (i === index ? { ...line, ...change } : line)),
    });
  const [unreadable, setUnreadable] = useState<ReadonlySet<string>>(new Set());
  /** Drops the fields under these keys (a line or a source gone or changed) from those unread. */
  const forget = (...keys: string[]) =>
    setUnreadable(
      (current) => new Set([...current].filter((key) => !keys.some((k) => key.startsWith(k)))),
    );
  /** A quantity field's new value: applied if it reads, else the field is held as unread. */
  const readAs = (key: string, value: number | undefined, apply: (value: number) => void) => {
    setUnreadable((current) => {
      const next = new Set(current);
      if (value === undefined) next.add(key);
      else next.delete(key);
      return next;
    });
    if (value !== undefined) apply(value);
  };
  return { draft, set, setLine, forget, readAs, anyUnread: unreadable.size > 0 };
}

export type PlanDraftEditor = ReturnType<typeof usePlanDraft>;
