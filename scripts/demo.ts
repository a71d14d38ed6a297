/**
 * One command for the demo: migrate, seed if empty, build, start on PORT (default 3000).
 */
import { execSync, spawn } from 'node:child_process';
import crypto from 'node:crypto';
import path from 'node:path';
import { DEMO_ORGS, DEMO_PASSWORD, DEMO_USERS } from '@/db/seed/demo-users';
import { startFakeSmtp } from '@/lib/server/mail/fake-smtp';

const port = process.env.PORT ?? '3000';
const env = {
  ...process.env,
  NEXTAUTH_URL: process.env.NEXTAUTH_URL ?? `http://localhost:${port}`,
  // A fresh secret per start only signs everyone out on restart; set NEXTAUTH_SECRET to keep sessions.
  NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET ?? crypto.randomBytes(32).toString('hex'),
};
const run = (cmd: string) => execSync(cmd, { stdio: 'inherit', env });

// E-mail: a real server when SMTP_URL is set; otherwise a local fake that keeps every message in data/mail/.
const mailDir = path.resolve('data/mail');
const smtp = process.env.SMTP_URL ? null : await startFakeSmtp({ port: Number(process.env.FAKE_SMTP_PORT ?? 0), dir: mailDir });
if (smtp) Object.assign(env, { SMTP_URL: smtp.url });

run('npx tsx db/migrate.ts');
run('npx tsx db/seed.ts');
run('npx next build');
console.log(`\nArcline demo on http://localhost:${port}. Demo sign-ins (password ${DEMO_PASSWORD} for all):`);
for (const u of DEMO_USERS) console.log(`  ${u.email.padEnd(28)} ${u.role.padEnd(11)} ${DEMO_ORGS.find((o) => o.slug === u.org)?.name ?? u.org}`);
console.log(smtp ? `\nE-mail goes to a local fake SMTP server (${smtp.url}); every message is kept in ${mailDir}/` : `\nE-mail goes to ${process.env.SMTP_URL}`);
console.log('');
const child = spawn('npx', ['next', 'start', '-p', port], { stdio: 'inherit', env });
child.on('exit', (code) => process.exit(code ?? 0));
