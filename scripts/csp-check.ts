/**
 * Opens the sign-in page, signs in, opens the editor and downloads the rigging CSV in Chromium against a
 * running server, and reports every CSP violation and console error. Usage: tsx scripts/csp-check.ts URL
 */
import { chromium } from '@playwright/test';

const base = process.argv[2] ?? 'http://127.0.0.1:3000';
const shots = process.argv[3] ?? '';

async function main() {
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const page = await browser.newPage({ viewport: { width: 1366, height: 900 } });
  const problems: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error' || /Content Security Policy|Refused to/.test(m.text())) problems.push(`${page.url()} console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`${page.url()} pageerror: ${e.message}`));
  await page.goto(`${base}/sign-in`);
  if (shots) await page.screenshot({ path: `${shots}/sign-in.png` });
  await page.getByLabel('E-mail').fill('operator@harrow.example');
  await page.getByLabel('Password').fill('arcline-demo-2026');
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL(/\/scenes/, { timeout: 60_000 });
  const link = page.locator('a[href^="/scenes/"]').filter({ hasNotText: 'New' }).first();
  const href = await link.getAttribute('href');
  await page.goto(`${base}${href?.replace(/\/details$/, '')}`);
  await page.waitForSelector('canvas', { timeout: 60_000 });
  await page.waitForTimeout(3000);
  if (shots) await page.screenshot({ path: `${shots}/editor.png` });
  await page.goto(`${base}/rigging`);
  const [download] = await Promise.all([page.waitForEvent('download', { timeout: 30_000 }), page.getByRole('link', { name: /export|csv/i }).first().click()]);
  console.log(`downloaded ${download.suggestedFilename()}`);
  await page.waitForTimeout(1000);
  console.log(problems.length ? problems.join('\n') : 'no CSP violations or console errors');
  await browser.close();
}
main().catch((e) => {
  console.error(e);
  process.exit(1);
});
