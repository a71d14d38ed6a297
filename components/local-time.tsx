'use client';

import { useEffect, useState } from 'react';
import { formatWhen } from '@/components/scenes/format';

/**
 * A timestamp in the viewer's time zone. The server renders it in UTC (marked so), then the browser swaps in
 * local time after hydration; rendering local time on the server would mismatch the browser's.
 */
export function LocalTime({ iso }: { iso: string }) {
  const [local, setLocal] = useState<string | null>(null);
  useEffect(() => setLocal(formatWhen(iso)), [iso]);
  const utc = new Date(iso).toLocaleString('en-GB', { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' }) + ' UTC';
  return (
    <time dateTime={iso} className="whitespace-nowrap tabular-nums">
      {local ?? utc}
    </time>
  );
}
