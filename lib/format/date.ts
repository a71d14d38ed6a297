/**
 * The app's one date format, in the reader's locale (Intl.DateTimeFormat): "2 Dec 2026" in en-GB,
 * "Dec 2, 2026" in en-US. A bare calendar date ("2026-11-02", as inspections are stored) is read as that
 * day wherever the reader is, not as UTC midnight shifted into their time zone.
 */
const DAY = /^\d{4}-\d{2}-\d{2}$/;

const dateFormat = (locale?: string) => new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const dateTimeFormat = (locale?: string) => new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

export function formatDate(value: string | Date, locale?: string): string {
  if (typeof value === 'string' && DAY.test(value)) return dateFormat(locale).format(new Date(`${value}T00:00:00Z`));
  const d = typeof value === 'string' ? new Date(value) : value;
  // A moment in time: its calendar day where the reader is.
  return new Intl.DateTimeFormat(locale, { day: 'numeric', month: 'short', year: 'numeric' }).format(d);
}

export function formatDateTime(value: string | Date, locale?: string): string {
  return dateTimeFormat(locale).format(typeof value === 'string' ? new Date(value) : value);
}
