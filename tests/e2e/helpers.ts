import { expect, type Page } from '@playwright/test';

export const PASSWORD = 'arcline-demo-2026';

export const VIEWPORTS = {
  laptop: { width: 1366, height: 900 },
  'tablet-portrait': { width: 820, height: 1180 },
  'tablet-landscape': { width: 1180, height: 820 },
} as const;

export async function signIn(page: Page, email: string, password = PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/scenes$/);
}

/**
 * Saves full-page screenshots of the current screen at the laptop and tablet viewports into
 * test-results/screens/, then puts the viewport back.
 */
export async function screens(page: Page, name: string, which: (keyof typeof VIEWPORTS)[] = ['laptop', 'tablet-portrait', 'tablet-landscape']) {
  const original = page.viewportSize();
  for (const v of which) {
    await page.setViewportSize(VIEWPORTS[v]);
    await page.waitForTimeout(150);
    await page.screenshot({ path: `test-results/screens/${name}-${v}.png`, fullPage: true });
  }
  if (original) await page.setViewportSize(original);
}
