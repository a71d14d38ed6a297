import { expect, test } from '@playwright/test';
import { screens, signIn, whoAmI } from './helpers';

test('bad credentials show a clear error and keep you on the sign-in page', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('operator@harrow.example');
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  const alert = page.getByRole('alert').filter({ hasText: 'Could not sign you in' });
  await expect(alert).toContainText('That e-mail and password do not match an active account.');
  await expect(page).toHaveURL(/\/sign-in$/);
  await screens(page, 'sign-in-error', ['laptop', 'tablet-portrait']);

  await page.getByLabel('E-mail').fill('');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByText('Enter your e-mail address')).toBeVisible();
});

test('sign out ends the session', async ({ page }) => {
  await signIn(page, 'trainer@harrow.example');
  await page.getByRole('button', { name: 'Sign out' }).filter({ visible: true }).click();
  await expect(page).toHaveURL(/\/sign-in\?signedOut=1$/);
  await expect(page.getByText('You are signed out.')).toBeVisible();
  await page.goto('/scenes');
  await expect(page).toHaveURL(/\/sign-in/);
  const me = await page.request.get('/api/me');
  expect(me.status()).toBe(401);
});

test('sign-in returns you to the page you asked for', async ({ page }) => {
  await page.goto('/settings');
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  await page.getByLabel('E-mail').fill('supervisor@harrow.example');
  await page.getByLabel('Password').fill('arcline-demo-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/settings$/);
});

test('units setting: imperial by default, metric after saving, kept after reload', async ({ page }) => {
  await signIn(page, 'supervisor@harrow.example');
  await page.goto('/settings');
  const imperial = page.getByRole('radio', { name: /Feet-inches and pounds/ });
  const metric = page.getByRole('radio', { name: /Metres and kilograms/ });
  await expect(imperial).toBeChecked();
  // 12.5 m = 492.13 in → 41′ 0″; 9,000 kg = 19,842 lb (lib/units exact factors).
  await expect(page.getByText('41′ 0″')).toBeVisible();
  await expect(page.getByText('19,842 lb')).toBeVisible();
  await metric.check();
  await page.getByRole('button', { name: 'Save units' }).click();
  await expect(page.getByText('Figures now show in metres and kilograms.')).toBeVisible();
  await screens(page, 'settings');
  await page.reload();
  await expect(metric).toBeChecked();
  expect((await (await page.request.get('/api/me')).json()).units).toBe('metric');
  await expect(whoAmI(page)).toContainText('Mitch Varga');
});
