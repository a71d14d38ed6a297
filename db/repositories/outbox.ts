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

/** How long a claimed message is left to the sender that claimed it before another may try it. */
export const CLAIM_MS = 5 * 60 * 1000;

/**
 * Claims a due message for this sender before it is sent: moves its next attempt CLAIM_MS on, only if it is
 * still pending with the next-attempt time it was read with. One conditional statement, so of several app
 * instances (or overlapping rounds in one) exactly one wins each message; a sender that dies mid-send leaves
 * the message to be retried once the claim runs out.
 */
export async function claimMail(db: Db, m: Pick<MailOutboxRow, 'id' | 'next_attempt_at'>, now: Date): Promise<boolean> {
  const res = await db
    .updateTable('mail_outbox')
    .set({ next_attempt_at: new Date(now.getTime() + CLAIM_MS).toISOString() })
    .where('id', '=', m.id)
    .where('state', '=', 'pending')
    .where('next_attempt_at', '=', m.next_attempt_at)
    .executeTakeFirst();
  return Number(res.numUpdatedRows) === 1;
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
