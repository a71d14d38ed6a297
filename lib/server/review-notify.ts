import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { insertNotifications } from '@/db/repositories/notifications';
import { enqueueMail } from '@/db/repositories/outbox';
import { composeMail, type MailParts } from '@/lib/review/mail';
import { appBaseUrl } from './mail/transport';

export interface Recipient {
  id: number;
  email: string;
}

/**
 * In-app notifications and e-mails for one event, written with the caller's transaction: they exist only
 * if the change that caused them commits. The worker (lib/server/mail/outbox-worker) sends after commit.
 */
export async function notifyPeople(
  trx: Kysely<Database>,
  e: { organisationId: number; sceneId: number; kind: string; message: string; path: string; recipients: Recipient[]; mail: Omit<MailParts, 'link'> & { linkLabel: string } },
) {
  const people = e.recipients.filter((r, i, all) => all.findIndex((q) => q.id === r.id) === i);
  if (!people.length) return;
  await insertNotifications(trx, people.map((r) => ({ organisationId: e.organisationId, userId: r.id, sceneId: e.sceneId, kind: e.kind, message: e.message, link: e.path })));
  const body = composeMail({ ...e.mail, link: { label: e.mail.linkLabel, url: `${appBaseUrl()}${e.path}` } });
  await enqueueMail(trx, people.map((r) => ({ organisationId: e.organisationId, toUserId: r.id, to: r.email, ...body })));
}
