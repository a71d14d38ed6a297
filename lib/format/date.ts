/**
 * The app's one date format, in the reader's locale (Intl.DateTimeFormat, medium date, short time):
 * "2 Dec 2026" / "2 Dec 2026, 14:05" in en-GB, "Dec 2, 2026" / "Dec 2, 2026, 2:05 PM" in en-US. Every
 * screen uses it through components/scenes/format.ts (LocalTime, LocalDay) or directly; the plan PDF and
 * e-mails use it with the zone stated. A bare calendar date ("2026-11-02", as inspections are stored) is
 * read as that day wherever the reader is, not as UTC midnight shifted into their time zone.
 */
const DAY = /^\d{4}-\d{2}-\d{2}$/;

const toDate = (value: string | Date) => (typeof value === 'string' ? new Date(DAY.test(value) ? `${value}T00:00:00Z` : value) : value);

/** A calendar day. `timeZone` applies to a moment (not to a bare date, which is always its own day). */
export function formatDate(value: string | Date, locale?: string, timeZone?: string): string {
  const d = toDate(value);
  if (Number.isNaN(d.getTime())) return String(value);
  const zone = typeof value === 'string' && DAY.test(value) ? 'UTC' : timeZone;
  return new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeZone: zone }).format(d);
}

/** A moment with its time, in `timeZone` (the reader's own when omitted). */
export function formatDateTime(value: string | Date, locale?: string, timeZone?: string): string {
  const d = toDate(value);
  if (Number.isNaN(d.getTime())) return String(value);
  return new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeStyle: 'short', timeZone }).format(d);
}

/**
 * The locale a server-made document (the plan PDF) writes dates in when it cannot ask the reader's
 * browser: US style for imperial users, day-month for metric ones.
 */
export const documentLocale = (units: 'imperial' | 'metric') => (units === 'imperial' ? 'en-US' : 'en-GB');
