import { sql, type Kysely } from 'kysely';
import type { Database, MailOutboxRow } from '../schema';

type Db = Kysely<Database>;

export interface OutgoingMail {
  organisationId: number;
  toUserId: number | null;
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Queues messages; call inside the transaction that caused them, so they exist only if it commits. */
export async function enqueueMail(db: Db, list: OutgoingMail[]) {
  if (!list.length) return;
  const now = new Date().toISOString();
  await db
    .insertInto('mail_outbox')
    .values(list.map((m) => ({ organisation_id: m.organisationId, to_user_id: m.toUserId, to_address: m.to, subject: m.subject, text_body: m.text, html_body: m.html, next_attempt_at: now, created_at: now })))
    .execute();
}

/** Pending messages whose next attempt is due, oldest first. */
export function dueMail(db: Db, now: string, limit = 20): Promise<MailOutboxRow[]> {
  return db.selectFrom('mail_outbox').selectAll().where('state', '=', 'pending').where('next_attempt_at', '<=', now).orderBy('id').limit(limit).execute();
}

export async function markSent(db: Db, id: number, messageId: string | null) {
  await db
    .updateTable('mail_outbox')
    .set({ state: 'sent', sent_at: new Date().toISOString(), message_id: messageId, attempts: sql`attempts + 1`, last_error: null })
    .where('id', '=', id)
    .execute();
}

/** Records a failed attempt: the next one is due at `retryAt`, or the message is given up (null). */
export async function markAttemptFailed(db: Db, id: number, error: string, retryAt: string | null) {
  await db
    .updateTable('mail_outbox')
    .set({ attempts: sql`attempts + 1`, last_error: error.slice(0, 1000), ...(retryAt ? { next_attempt_at: retryAt } : { state: 'failed' as const }) })
    .where('id', '=', id)
    .execute();
}
