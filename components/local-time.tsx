'use client';

import { useSyncExternalStore } from 'react';
import { formatDay, formatWhen } from '@/components/scenes/format';
import { formatDateTime } from '@/lib/format/date';

const noSubscription = () => () => {};

/**
 * A timestamp in the viewer's time zone. The server renders it in UTC (marked so), then the browser swaps in
 * local time after hydration; rendering local time on the server would mismatch the browser's.
 */
export function LocalTime({ iso }: { iso: string }) {
  const local = useSyncExternalStore(noSubscription, () => formatWhen(iso), () => null);
  const utc = `${formatDateTime(iso, 'en-GB', 'UTC')} UTC`;
  return (
    <time dateTime={iso} className="whitespace-nowrap tabular-nums">
      {local ?? utc}
    </time>
  );
}

/** A calendar date (YYYY-MM-DD) in the viewer's locale; the server renders the ISO date, the browser swaps it. */
export function LocalDay({ ymd }: { ymd: string }) {
  const local = useSyncExternalStore(noSubscription, () => formatDay(ymd), () => null);
  return (
    <time dateTime={ymd} className="whitespace-nowrap tabular-nums">
      {local ?? ymd}
    </time>
  );
}
