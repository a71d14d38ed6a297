/** Calendar dates as YYYY-MM-DD strings (UTC), the form inspection dates are stored in; they sort as dates. */

/** Today's date. */
export const today = () => new Date().toISOString().slice(0, 10);

/** The date `days` after `date`. */
export function addDays(date: string, days: number): string {
  return new Date(Date.parse(`${date}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
}

/** An inspection falling due within this many days counts as due soon (the inventory's filter and badge). */
export const DUE_SOON_DAYS = 30;
