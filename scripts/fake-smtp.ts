/**
 * The local fake SMTP server as its own process, for the e2e server (scripts/e2e-server.sh): listens on
 * FAKE_SMTP_PORT and keeps every message as an .eml file in MAIL_DIR until it is stopped.
 */
import { startFakeSmtp } from '@/lib/server/mail/fake-smtp';

const port = Number(process.env.FAKE_SMTP_PORT);
const dir = process.env.MAIL_DIR;
if (!Number.isInteger(port) || port <= 0 || !dir) {
  console.error('fake-smtp: set FAKE_SMTP_PORT and MAIL_DIR');
  process.exit(2);
}
const smtp = await startFakeSmtp({ port, dir });
console.log(`fake SMTP on ${smtp.url}, keeping messages in ${dir}`);
