import { getDb } from '@/db';
import { route } from '@/lib/api/route';
import { markRead, unreadCount } from '@/db/repositories/notifications';
import { markReadSchema } from '@/lib/validations/review';

export const runtime = 'nodejs';

/** Marks the user's own notifications read (anyone else's ids are ignored). */
export const POST = route({ body: markReadSchema }, async ({ user, body }) => {
  const db = getDb();
  const marked = await markRead(db, user.id, body.ids);
  return { marked, unread: await unreadCount(db, user.id) };
});
