import type { Kysely } from 'kysely';
import type { Transporter } from 'nodemailer';
import type { Database } from '@/db/schema';
import { getDb } from '@/db';
import { claimMail, dueMail, markAttemptFailed, markSent } from '@/db/repositories/outbox';
import { MAIL_FROM, mailTransport } from './transport';

/** Retry schedule after a failed send: 30 s, 1, 2, 4, 8 min; after six attempts the message is given up. */
export const MAX_ATTEMPTS = 6;
export const backoffMs = (attempts: number) => 30_000 * 2 ** (attempts - 1);

/**
 * Sends every due outbox message once. Runs after the transaction that queued them has committed, so a
 * slow or failing mail server never holds up or fails a request. Each message is claimed first, so another
 * instance's round (several app instances share the outbox) never sends it too. Returns what happened.
 */
export async function deliverDueMail(db: Kysely<Database>, transport: Transporter, now = new Date()): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  for (const m of await dueMail(db, now.toISOString())) {
    if (!(await claimMail(db, m, now))) continue;
    try {
      const info = await transport.sendMail({ from: MAIL_FROM, to: m.to_address, subject: m.subject, text: m.text_body, html: m.html_body });
      await markSent(db, m.id, typeof info?.messageId === 'string' ? info.messageId : null);
      sent++;
    } catch (e) {
      const attempts = m.attempts + 1;
      const retryAt = attempts >= MAX_ATTEMPTS ? null : new Date(now.getTime() + backoffMs(attempts)).toISOString();
      await markAttemptFailed(db, m.id, e instanceof Error ? e.message : String(e), retryAt);
      failed++;
    }
  }
  return { sent, failed };
}

let running: Promise<unknown> | null = null;
let again = false;
let timer: ReturnType<typeof setInterval> | null = null;

/**
 * Fire and forget, after commit: delivers what is due now, and keeps a slow timer for retries. Without
 * SMTP_URL nothing is sent and messages wait in the outbox.
 */
export function kickOutbox(): void {
  const transport = mailTransport();
  if (!transport) return;
  if (!timer) {
    timer = setInterval(() => kickOutbox(), 15_000);
    timer.unref?.();
  }
  if (running) {
    again = true;
    return;
  }
  running = deliverDueMail(getDb(), transport)
    .catch((e) => console.error('mail outbox: delivery round failed', e))
    .finally(() => {
      running = null;
      if (again) {
        again = false;
        kickOutbox();
      }
    });
}

/** Resolves when the current delivery round (if any) is done: for tests and the demo. */
export async function outboxIdle(): Promise<void> {
  while (running) await running;
}
