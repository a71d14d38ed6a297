'use client';
import { useState } from 'react';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { LocalTime } from '@/components/local-time';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { sendJson } from './post-json';

export interface NotificationView {
  id: number;
  kind: string;
  message: string;
  link: string;
  read: boolean;
  createdAt: string;
}

const KIND_WORDS: Record<string, string> = { submitted: 'For review', approved: 'Approved', returned: 'Returned', comment: 'Comment' };

/** Opening a notification marks it read; "Mark all as read" clears the count in the navigation. */
export function NotificationList({ items }: { items: NotificationView[] }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const unread = items.filter((n) => !n.read).map((n) => n.id);
  const mark = async (ids: number[]) => {
    if (!ids.length) return;
    await sendJson('POST', '/api/notifications/read', { ids });
    router.refresh();
  };
  return (
    <div className="flex flex-col gap-3">
      {unread.length > 0 && (
        <div>
          <Button
            variant="secondary"
            disabled={busy}
            onClick={async () => {
              setBusy(true);
              await mark(unread);
              setBusy(false);
            }}
          >
            Mark all as read
          </Button>
        </div>
      )}
      <ol className="divide-y divide-paper-line rounded-plate border border-paper-line bg-paper-raised" data-testid="notifications">
        {items.map((n) => (
          <li key={n.id} className={cx('flex flex-wrap items-baseline gap-x-3 gap-y-1 px-4 py-3', !n.read && 'bg-signal-light/40')}>
            <span className={cx('w-24 shrink-0 text-caption font-bold uppercase tracking-wide', n.read ? 'text-ink-muted' : 'text-ink')}>
              {!n.read && <span className="mr-1 inline-block h-2 w-2 rounded-full bg-over" aria-label="unread" />}
              {KIND_WORDS[n.kind] ?? n.kind}
            </span>
            <Link href={n.link} onClick={() => void mark(n.read ? [] : [n.id])} className={cx('min-w-0 flex-1 text-body underline-offset-4 hover:underline', n.read ? 'text-ink-soft' : 'font-semibold text-ink')}>
              {n.message}
            </Link>
            <span className="text-caption text-ink-muted">
              <LocalTime iso={n.createdAt} />
            </span>
          </li>
        ))}
      </ol>
    </div>
  );
}
