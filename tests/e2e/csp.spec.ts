import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, sceneIdByTitle, signIn } from './helpers';

/**
 * Issue 11 item 4: the strict CSP is one the app really works under. Every Content-Security-Policy
 * violation the page reports (the DOM event) or logs (Chromium's console message) is collected while a
 * user signs in, opens the editor until its analysis is done, and downloads the lift plan PDF.
 */
async function watchViolations(page: Page): Promise<() => Promise<string[]>> {
  const logged: string[] = [];
  page.on('console', (m) => {
    if (/Content Security Policy/i.test(m.text())) logged.push(m.text());
  });
  await page.addInitScript(() => {
    const w = window as unknown as { __csp: string[] };
    w.__csp = [];
    document.addEventListener('securitypolicyviolation', (e) => w.__csp.push(`${e.violatedDirective} ${e.blockedURI}`));
  });
  return async () => [...logged, ...(await page.evaluate(() => (window as unknown as { __csp: string[] }).__csp))];
}

test('the sign-in page, the editor and the PDF download run with no CSP violation', async ({ page }) => {
  test.setTimeout(180_000);
  const violations = await watchViolations(page);
  await page.goto('/sign-in');
  const csp = (await page.request.get('/sign-in')).headers()['content-security-policy'] ?? '';
  expect(csp).toContain("frame-ancestors 'none'");
  expect(csp).toMatch(/script-src[^;]*'nonce-/);
  expect(await violations()).toEqual([]);

  await signIn(page, 'operator@harrow.example');
  await page.goto(`/scenes/${await sceneIdByTitle(page, HARROW_SCENES.coil)}`);
  await page.waitForFunction(() => !!window.__arclineEditor?.store.getState().analysis?.result, undefined, { timeout: 90_000 });
  expect(await violations()).toEqual([]);

  const [pdf] = await Promise.all([page.waitForEvent('download'), page.getByTestId('editor-download-plan').click()]);
  expect(await pdf.failure()).toBeNull();
  expect(pdf.suggestedFilename()).toMatch(/\.pdf$/);
  expect(await violations()).toEqual([]);
});
