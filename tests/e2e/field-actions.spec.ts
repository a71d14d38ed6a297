import { expect, test } from '@playwright/test';
import { PASSWORD, createSceneViaApi, listedTitles, signIn } from './helpers';

// Several pages and two browser contexts per test, on a machine shared with other builds.
test.describe.configure({ timeout: 150_000 });

test('delete then restore: the scene leaves the list, an admin finds it under Recently deleted and restores it', async ({ page, browser }) => {
  await signIn(page, 'operator@harrow.example');
  const title = `Delete me: tow dolly at the depot ${Date.now()}`;
  const id = await createSceneViaApi(page, title);
  await page.goto(`/scenes/${id}/details`);
  await page.getByTestId('scene-actions').getByRole('button', { name: 'Delete…' }).click();
  await expect(page.getByText('An admin can restore it for 30 days.')).toBeVisible();
  await page.getByRole('button', { name: 'Delete the scene' }).click();
  await expect(page).toHaveURL(/\/scenes$/);
  expect(await listedTitles(page)).not.toContain(title);
  expect((await page.request.get(`/api/scenes/${id}`)).status()).toBe(404);

  const admin = await (await browser.newContext()).newPage();
  await signIn(admin, 'admin@harrow.example');
  await admin.getByRole('link', { name: 'Recently deleted' }).click();
  await expect(admin.getByRole('heading', { name: 'Recently deleted' })).toBeVisible();
  await expect(admin.getByText(title)).toBeVisible();
  await admin.getByRole('button', { name: `Restore ${title}` }).click();
  await expect(admin.getByText(title)).toHaveCount(0);

  await page.reload();
  expect(await listedTitles(page)).toContain(title);
  expect((await page.request.get(`/api/scenes/${id}`)).status()).toBe(200);
});

test('duplicate from the list: the copy opens as a new draft of the operator’s own', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  const title = `Copy source: winch-out at Pell Ford ${Date.now()}`;
  await createSceneViaApi(page, title);
  await page.goto(`/scenes?q=${encodeURIComponent('Pell Ford')}`);
  await page.getByLabel(`Actions for ${title}`).click();
  await page.getByRole('button', { name: `Duplicate ${title}` }).click();
  await expect(page).toHaveURL(/\/scenes\/\d+\/details$/);
  await expect(page.getByTestId('scene-title')).toHaveText(`Copy of ${title}`);
  await expect(page.getByTestId('scene-revision')).toHaveText('1');
});

test('archive hides a scene from the list until it is unarchived', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  const title = `Archive me: car hauler at Tamsin Cross ${Date.now()}`;
  const id = await createSceneViaApi(page, title);
  await page.goto(`/scenes/${id}/details`);
  await page.getByTestId('scene-actions').getByRole('button', { name: 'Archive' }).click();
  await expect(page.getByTestId('scene-actions').getByRole('button', { name: 'Unarchive' })).toBeVisible();
  await page.goto('/scenes');
  expect(await listedTitles(page)).not.toContain(title);
  await page.goto('/scenes?status=archived');
  expect(await listedTitles(page)).toContain(title);
});

test('a deactivated user cannot sign in, and their open session ends', async ({ page, browser }) => {
  await signIn(page, 'admin@harrow.example');
  const email = `leaver.${Date.now()}@harrow.example`;
  const created = await page.request.post('/api/users', { data: { name: 'Leaver Example', email, role: 'operator', password: PASSWORD } });
  expect(created.status()).toBe(201);
  const { id } = await created.json();

  const theirs = await (await browser.newContext()).newPage();
  await signIn(theirs, email);

  await page.goto('/admin/users');
  page.once('dialog', (d) => void d.accept());
  await page.getByRole('button', { name: 'Deactivate Leaver Example' }).click();
  await expect(page.getByRole('button', { name: 'Reactivate Leaver Example' })).toBeVisible();
  expect((await page.request.get('/api/users')).ok()).toBe(true);

  // The open session is over at its next request.
  await theirs.goto('/scenes');
  await expect(theirs).toHaveURL(/\/sign-in/);
  expect((await theirs.request.get('/api/me')).status()).toBe(401);
  // And signing in again is refused with the same words as a wrong password.
  await theirs.getByLabel('E-mail').fill(email);
  await theirs.getByLabel('Password').fill(PASSWORD);
  await theirs.getByRole('button', { name: 'Sign in' }).click();
  await expect(theirs.getByRole('alert').filter({ hasText: 'Could not sign you in' })).toContainText('do not match an active account');
  await expect(theirs).toHaveURL(/\/sign-in/);
  expect(id).toBeGreaterThan(0);
});
