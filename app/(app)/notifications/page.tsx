import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { getDb } from '@/db';
import { listNotifications } from '@/db/repositories/notifications';
import { getCurrentUser } from '@/lib/auth/current-user';
import { PageHeader } from '@/components/ui/page-header';
import { EmptyState } from '@/components/ui/empty-state';
import { NotificationList } from '@/components/review/notification-list';

export const metadata: Metadata = { title: 'Notifications' };

/** The signed-in user's notifications (submissions, decisions, comments), newest first. */
export default async function NotificationsPage() {
  const user = await getCurrentUser();
  if (!user) redirect('/sign-in?callbackUrl=/notifications');
  const items = await listNotifications(getDb(), user.id);
  const unread = items.filter((n) => !n.read).length;
  return (
    <>
      <PageHeader eyebrow="Review desk" title="Notifications" description={`${unread ? `${unread} unread` : 'Nothing unread'} · the latest ${items.length === 50 ? 50 : items.length} shown, newest first.`} />
      {items.length ? (
        <NotificationList items={items} />
      ) : (
        <EmptyState title="No notifications yet">Submissions, decisions and comments on your plans appear here, and by e-mail.</EmptyState>
      )}
    </>
  );
}
