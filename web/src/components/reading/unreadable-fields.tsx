import { createContext, useCallback, useContext, useEffect, useId, useMemo, useState } from 'react';

/** A field whose text does not read (yet), and why. */
export interface UnreadableField {
  label: string;
  reason: string;
}

interface Registry {
  report: (id: string, field: UnreadableField | undefined) => void;
}

export const UnreadableFieldsContext = createContext<Registry>({ report: () => undefined });

/**
 * Collects the fields of one form whose text does not read, so the form can refuse to save and
 * its results can say which field holds them back. Use the registry as the context's value.
 */
export function useUnreadableFields(): [UnreadableField[], Registry] {
  const [fields, setFields] = useState<ReadonlyMap<string, UnreadableField>>(new Map());
  const report = useCallback((id: string, field: UnreadableField | undefined) => {
    setFields((current) => {
      const before = current.get(id);
      if (before?.label === field?.label && before?.reason === field?.reason) return current;
      const next = new Map(current);
      if (field) next.set(id, field);
      else next.delete(id);
      return next;
    });
  }, []);
  const registry = useMemo(() => ({ report }), [report]);
  return [[...fields.values()], registry];
}

/** Tells the enclosing form that this field does not read, or reads again (`undefined`). */
export function useReportUnreadable(field: UnreadableField | undefined): void {
  const { report } = useContext(UnreadableFieldsContext);
  const id = useId();
  const label = field?.label;
  const reason = field?.reason;
  useEffect(() => {
    report(id, label !== undefined && reason !== undefined ? { label, reason } : undefined);
  }, [report, id, label, reason]);
  useEffect(() => () => report(id, undefined), [report, id]);
}

/** "Diameter (could be 1.5 or 1500: …)": what holds a form back, in one line. */
export function describeUnreadable(fields: readonly UnreadableField[]): string {
  return fields.map((field) => `${field.label}: ${field.reason}`).join('; ');
}
