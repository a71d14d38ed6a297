/**
 * Dates in one format across the app, following the viewer's locale (Intl.DateTimeFormat with the browser's
 * default locale): "2 Dec 2026, 14:05" for en-GB, "Dec 2, 2026, 2:05 PM" for en-US. Only call from client
 * components after hydration (the server's locale and time zone differ); LocalTime and LocalDay do that.
 */
const WHEN = () => new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
// Calendar dates (YYYY-MM-DD, e.g. inspection dates) are days, not instants: format them in UTC so no zone shifts them.
const DAY = () => new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone: 'UTC' });

/** A moment in the viewer's time zone and locale. */
export function formatWhen(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return WHEN().format(d);
}

/** A calendar date ("2026-11-02") in the viewer's locale, as the same medium date style. */
export function formatDay(ymd: string): string {
  const t = Date.parse(`${ymd}T00:00:00Z`);
  return Number.isNaN(t) ? ymd : DAY().format(t);
}
