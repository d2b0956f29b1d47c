/** Rows kept in a profile series; longer integrations are thinned evenly (end points kept). */
export const MAX_SERIES_ROWS = 600;

/** At most MAX_SERIES_ROWS of `rows`, evenly spaced, the first and last always kept. */
export function thinRows<T>(rows: readonly T[]): T[] {
  if (rows.length <= MAX_SERIES_ROWS) return [...rows];
  const stride = (rows.length - 1) / (MAX_SERIES_ROWS - 1);
  return Array.from(
    { length: MAX_SERIES_ROWS },
    (_, index) => rows[Math.round(index * stride)] as T,
  );
}
