import type { Kysely } from 'kysely';
import type { Database } from '../schema';

type Db = Kysely<Database>;

export interface NewNotification {
  organisationId: number;
  userId: number;
  sceneId: number | null;
  kind: string;
  message: string;
  link: string;
}

export async function insertNotifications(db: Db, list: NewNotification[]) {
  if (!list.length) return;
  const now = new Date().toISOString();
  await db
    .insertInto('notifications')
    .values(list.map((n) => ({ organisation_id: n.organisationId, user_id: n.userId, scene_id: n.sceneId, kind: n.kind, message: n.message, link: n.link, created_at: now })))
    .execute();
}

export async function listNotifications(db: Db, userId: number, limit = 50) {
  const rows = await db
    .selectFrom('notifications')
    .select(['id', 'scene_id', 'kind', 'message', 'link', 'read_at', 'created_at'])
    .where('user_id', '=', userId)
    .orderBy('id', 'desc')
    .limit(limit)
    .execute();
  return rows.map((r) => ({ id: r.id, sceneId: r.scene_id, kind: r.kind, message: r.message, link: r.link, read: r.read_at !== null, createdAt: r.created_at }));
}

export async function unreadCount(db: Db, userId: number): Promise<number> {
  const r = await db.selectFrom('notifications').select((eb) => eb.fn.countAll<number>().as('n')).where('user_id', '=', userId).where('read_at', 'is', null).executeTakeFirstOrThrow();
  return Number(r.n);
}

/** Marks the user's own notifications read; ids of anyone else's are ignored. Returns how many changed. */
export async function markRead(db: Db, userId: number, ids: number[]): Promise<number> {
  if (!ids.length) return 0;
  const res = await db
    .updateTable('notifications')
    .set({ read_at: new Date().toISOString() })
    .where('user_id', '=', userId)
    .where('id', 'in', ids)
    .where('read_at', 'is', null)
    .executeTakeFirst();
  return Number(res.numUpdatedRows);
}

/** Active users of the organisation with one of the roles (the recipients of a submission). */
export function usersWithRole(db: Db, organisationId: number, roles: readonly ('supervisor' | 'admin' | 'operator' | 'trainer')[]) {
  return db
    .selectFrom('users')
    .select(['id', 'email', 'name'])
    .where('organisation_id', '=', organisationId)
    .where('active', '=', 1)
    .where('role', 'in', [...roles])
    .orderBy('id')
    .execute();
}
