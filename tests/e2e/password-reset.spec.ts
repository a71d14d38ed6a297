import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { expect, test } from '@playwright/test';
import { simpleParser, type ParsedMail } from 'mailparser';
import { PASSWORD, screens, signIn } from './helpers';

const MAIL_DIR = path.join(process.cwd(), 'data', 'e2e', 'mail');
const NEW_PASSWORD = 'tailboard chains 2026 dusk';

/** Every message the fake SMTP server has kept for this address. */
async function mailFor(address: string): Promise<ParsedMail[]> {
  const files = readdirSync(MAIL_DIR).filter((f) => f.endsWith('.eml'));
  const parsed = await Promise.all(files.map((f) => simpleParser(readFileSync(path.join(MAIL_DIR, f)))));
  return parsed.filter((m) => (Array.isArray(m.to) ? m.to : [m.to]).some((a) => a?.value.some((v) => v.address === address)));
}

test('an admin e-mails a reset link; the user sets a new password from it once, and the admin never sees it', async ({ page, browser }) => {
  test.setTimeout(150_000);
  await signIn(page, 'admin@harrow.example');
  const email = `reset.${Date.now()}@harrow.example`;
  const created = await page.request.post('/api/users', { data: { name: 'Rhea Example', email, role: 'operator', password: PASSWORD } });
  expect(created.status()).toBe(201);

  await page.goto('/admin/users');
  page.once('dialog', (d) => {
    expect(d.message()).toContain(email);
    void d.accept();
  });
  const sent = page.waitForResponse((r) => r.url().includes('/password-reset') && r.request().method() === 'POST');
  await page.getByRole('button', { name: 'Send Rhea Example a password reset link' }).click();
  const answer = await (await sent).json();
  await expect(page.getByText(`Rhea Example has been e-mailed a link at ${email}. It works once, for 24 hours.`)).toBeVisible();
  await screens(page, 'password-reset-admin', ['laptop', 'tablet-portrait', 'phone']);

  // The fake SMTP server has the message, with the link; the admin's answer and page do not carry it.
  await expect.poll(async () => (await mailFor(email).catch(() => [])).length, { timeout: 45_000 }).toBe(1);
  const [mail] = await mailFor(email);
  expect(mail.subject).toBe('Set a new Arcline password');
  expect(mail.text).not.toContain(PASSWORD);
  const link = /https?:\/\/\S+\/reset-password\?token=[A-Za-z0-9_-]{43}/.exec(mail.text ?? '')?.[0];
  expect(link).toBeTruthy();
  const token = new URL(link!).searchParams.get('token')!;
  expect(JSON.stringify(answer)).not.toContain(token);
  expect(await page.content()).not.toContain(token);

  // The user, signed out, follows the link.
  const theirs = await (await browser.newContext()).newPage();
  await theirs.goto(link!);
  await expect(theirs.getByRole('heading', { name: 'Set a new password' })).toBeVisible();
  await expect(theirs.getByText('Rhea Example')).toBeVisible();
  await theirs.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD);
  await theirs.getByLabel('New password again').fill(`${NEW_PASSWORD}x`);
  await theirs.getByRole('button', { name: 'Set the new password' }).click();
  await expect(theirs.getByText('The two passwords are not the same')).toBeVisible();
  await screens(theirs, 'password-reset-page', ['laptop', 'tablet-portrait', 'phone']);
  await theirs.getByLabel('New password again').fill(NEW_PASSWORD);
  await theirs.getByRole('button', { name: 'Set the new password' }).click();
  await expect(theirs).toHaveURL(/\/sign-in\?passwordSet=1/);
  await expect(theirs.getByText('Your new password is set. Sign in with it.')).toBeVisible();

  // The old password no longer signs in; the new one does.
  await theirs.getByLabel('E-mail').fill(email);
  await theirs.getByLabel('Password').fill(PASSWORD);
  await theirs.getByRole('button', { name: 'Sign in' }).click();
  await expect(theirs.getByRole('alert').filter({ hasText: 'Could not sign you in' })).toBeVisible();
  await signIn(theirs, email, NEW_PASSWORD);

  // The link works once.
  const later = await (await browser.newContext()).newPage();
  await later.goto(link!);
  await expect(later.getByText('This link no longer works')).toBeVisible();
  await expect(later.getByLabel('New password', { exact: true })).toHaveCount(0);
  await screens(later, 'password-reset-dead-link', ['laptop', 'tablet-portrait', 'phone']);
});
