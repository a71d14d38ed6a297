import { formatDate, formatDateTime } from '@/lib/format/date';

/**
 * Dates on screen, in the one format (lib/format/date.ts) and the viewer's locale and time zone. Only call
 * from client components after hydration (the server's locale and time zone differ); LocalTime and
 * LocalDay do that.
 */
export const formatWhen = (iso: string): string => formatDateTime(iso);

/** A calendar date ("2026-11-02") in the viewer's locale, as the same medium date style. */
export const formatDay = (ymd: string): string => formatDate(ymd);
