import { expect, test } from '@playwright/test';
import { screens, signIn } from './helpers';

test('landing page says what Arcline does and leads to sign-in', async ({ page }) => {
  await page.goto('/');
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Plan the lift before the first leg goes down.');
  await expect(page.getByTestId('caution-note')).toContainText("The manufacturer's load chart and operator's manual govern.");
  await screens(page, 'landing');
  await page.getByRole('link', { name: 'Sign in →' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await screens(page, 'sign-in');
});

test('an operator signs in and sees their scenes', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  const who = page.getByTestId('who-am-i').first();
  await expect(who).toContainText('Dana Okafor');
  await expect(page.getByRole('link', { name: 'Coil transfer, Route 9 weigh station', exact: true })).toBeVisible();
  await screens(page, 'scenes-operator');
});
