/**
 * "4 December 2026 at 02:10 GMT+1": a moment in the reader's time zone, with its offset, so a
 * printed or shared page says unambiguously when something happened.
 */
export function localMoment(iso: string): string {
  // dateStyle and timeStyle cannot be combined with timeZoneName, so the parts are named.
  return new Intl.DateTimeFormat(undefined, {
    year: 'numeric',
    month: 'long',
    day: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    timeZoneName: 'shortOffset',
  }).format(new Date(iso));
}
