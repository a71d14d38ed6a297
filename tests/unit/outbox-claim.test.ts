import { beforeAll, describe, expect, it } from 'vitest';
import type { Transporter } from 'nodemailer';
import { getDb } from '@/db';
import { CLAIM_MS, claimMail, enqueueMail } from '@/db/repositories/outbox';
import { deliverDueMail } from '@/lib/server/mail/outbox-worker';
import { freshSeededDb } from '@/tests/setup/db';

/** A mail server that takes a moment per message and records every recipient it was handed. */
function recordingTransport() {
  const to: string[] = [];
  const transport = {
    sendMail: async (m: { to: string }) => {
      await new Promise((r) => setTimeout(r, 5));
      to.push(m.to);
      return { messageId: `<${to.length}@arcline.test>` };
    },
  } as unknown as Transporter;
  return { to, transport };
}

let organisationId: number;
beforeAll(async () => {
  const db = await freshSeededDb();
  // The seed's own queued mail goes first, so each test counts only its own messages.
  await deliverDueMail(db, recordingTransport().transport);
  organisationId = (await db.selectFrom('organisations').select('id').where('slug', '=', 'harrow-ridge').executeTakeFirstOrThrow()).id;
});

const queue = (addresses: string[]) =>
  enqueueMail(getDb(), addresses.map((to) => ({ organisationId, toUserId: null, to, subject: 'Plan approved', text: 'text', html: '<p>html</p>' })));

describe('mail outbox shared by several app instances', () => {
  it('two delivery rounds running at once send every message exactly once', async () => {
    const addresses = Array.from({ length: 6 }, (_, i) => `crew${i}@harrow.example`);
    await queue(addresses);
    const a = recordingTransport();
    const b = recordingTransport();
    const [ra, rb] = await Promise.all([deliverDueMail(getDb(), a.transport), deliverDueMail(getDb(), b.transport)]);
    expect(ra.sent + rb.sent).toBe(6);
    expect([...a.to, ...b.to].sort()).toEqual(addresses.sort());
    const rows = await getDb().selectFrom('mail_outbox').select(['state', 'attempts']).where('to_address', 'in', addresses).execute();
    expect(rows.map((r) => [r.state, r.attempts])).toEqual(addresses.map(() => ['sent', 1]));
  });

  it('a claimed message is left alone until the claim runs out, then retried', async () => {
    await queue(['night-shift@harrow.example']);
    const db = getDb();
    const row = await db.selectFrom('mail_outbox').select(['id', 'next_attempt_at']).where('to_address', '=', 'night-shift@harrow.example').executeTakeFirstOrThrow();
    const now = new Date(Date.parse(row.next_attempt_at) + 1000);
    // Another instance claimed it and then died before sending.
    expect(await claimMail(db, row, now)).toBe(true);
    expect(await claimMail(db, row, now)).toBe(false);
    const t = recordingTransport();
    expect(await deliverDueMail(db, t.transport, new Date(now.getTime() + CLAIM_MS - 1000))).toEqual({ sent: 0, failed: 0 });
    expect(await deliverDueMail(db, t.transport, new Date(now.getTime() + CLAIM_MS + 1000))).toEqual({ sent: 1, failed: 0 });
    expect(t.to).toEqual(['night-shift@harrow.example']);
  });
});
