import fs from 'node:fs';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';

export interface CapturedMail {
  from: string;
  to: string[];
  raw: string;
  receivedAt: string;
}

/**
 * A local SMTP server that keeps every message it receives: in memory, and as .eml files in `dir` when
 * given (the demo writes them to data/mail/). For the demo and the tests only; it accepts any sender.
 */
export async function startFakeSmtp(opts: { port?: number; dir?: string } = {}) {
  const messages: CapturedMail[] = [];
  if (opts.dir) fs.mkdirSync(opts.dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    secure: false,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        const mail: CapturedMail = {
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          raw: Buffer.concat(chunks).toString('utf8'),
          receivedAt: new Date().toISOString(),
        };
        messages.push(mail);
        if (opts.dir) fs.writeFileSync(path.join(opts.dir, `${mail.receivedAt.replace(/[:.]/g, '-')}-${messages.length}.eml`), mail.raw);
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port ?? 0, '127.0.0.1', () => resolve());
  });
  const port = (server.server.address() as { port: number }).port;
  return {
    port,
    url: `smtp://127.0.0.1:${port}`,
    messages,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
