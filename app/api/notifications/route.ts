import { getDb } from '@/db';
import { route } from '@/lib/api/route';
import { listNotifications, unreadCount } from '@/db/repositories/notifications';

export const runtime = 'nodejs';

/** The signed-in user's notifications, newest first (the latest 50), with the unread count. */
export const GET = route({}, async ({ user }) => {
  const db = getDb();
  return { items: await listNotifications(db, user.id), unread: await unreadCount(db, user.id) };
});
