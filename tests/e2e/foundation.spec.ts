import { expect, test, type Page } from '@playwright/test';
import { COBALT_SCENE, HARROW_SCENES, listedTitles, sceneLink, screens, signIn, whoAmI } from './helpers';

const mainNav = (page: Page) => page.getByRole('navigation', { name: 'Main' });

async function navLabels(page: Page) {
  // A link's unread or waiting count follows its label ("Notifications1"): the label alone is compared.
  return (await mainNav(page).getByRole('link').allTextContents()).map((t) => t.trim().replace(/\d+$/, ''));
}

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

test('signed out, app pages send you to sign-in', async ({ page }) => {
  await page.goto('/scenes');
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto('/admin/users');
  await expect(page).toHaveURL(/\/sign-in/);
});

test('Harrow operator: own and approved scenes, New scene button, no Users nav, 403 at /admin/users', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await expect(whoAmI(page)).toContainText('Dana Okafor');
  await expect(whoAmI(page)).toContainText('Operator');
  await expect(whoAmI(page)).toContainText('Harrow Ridge Recovery');
  expect(await navLabels(page)).toEqual(['Scenes', 'Notifications', 'Equipment', 'Rigging', 'Lessons', 'Settings']);
  await expect(page.getByRole('link', { name: '+ New scene' })).toBeVisible();
  await screens(page, 'scenes-operator');
  // Searched, not read off page 1: other journeys add scenes of this operator that push the seeded ones down.
  for (const title of [HARROW_SCENES.coil, HARROW_SCENES.reefer]) {
    await page.goto(`/scenes?q=${encodeURIComponent(title.split(',')[0]!)}`);
    expect(await listedTitles(page)).toContain(title);
  }
  await page.goto(`/scenes?q=${encodeURIComponent('Quarry Road')}`);
  expect(await listedTitles(page)).not.toContain(COBALT_SCENE);

  const res = await page.goto('/admin/users');
  expect(res?.status()).toBe(403);
  await expect(page.getByText('403 · Not available for your role')).toBeVisible();
  await expect(page.getByRole('heading', { name: 'This page is for administrators' })).toBeVisible();
  // Inside the signed-in shell, with the way back.
  await expect(whoAmI(page)).toContainText('Dana Okafor');
  await expect(page.getByRole('link', { name: 'Back to scenes' })).toBeVisible();
  await expect(page.getByRole('table')).toHaveCount(0);
  await screens(page, 'forbidden-operator', ['laptop', 'tablet-portrait']);
});

for (const who of [
  { email: 'supervisor@harrow.example', name: 'Mitch Varga', role: 'Supervisor', nav: ['Scenes', 'Review', 'Notifications', 'Equipment', 'Rigging', 'Lessons', 'Settings'] },
  { email: 'trainer@harrow.example', name: 'Priya Lindqvist', role: 'Trainer', nav: ['Scenes', 'Notifications', 'Equipment', 'Rigging', 'Lessons', 'Settings'] },
]) {
  test(`Harrow ${who.role.toLowerCase()}: every org scene, no New scene, no Users`, async ({ page }) => {
    await signIn(page, who.email);
    await expect(whoAmI(page)).toContainText(who.name);
    await expect(whoAmI(page)).toContainText(who.role);
    expect(await navLabels(page)).toEqual(who.nav);
    await expect(page.getByRole('link', { name: '+ New scene' })).toHaveCount(0);
    // Searched, not read off page 1: earlier journeys add scenes that push the seeded ones down the list.
    // The draft belongs to the operator: supervisors and trainers read it, an operator colleague would not.
    for (const title of [HARROW_SCENES.coil, HARROW_SCENES.reefer]) {
      await page.goto(`/scenes?q=${encodeURIComponent(title.split(',')[0]!)}`);
      expect(await listedTitles(page)).toContain(title);
    }
    await page.goto(`/scenes?q=${encodeURIComponent('Quarry Road')}`);
    expect(await listedTitles(page)).not.toContain(COBALT_SCENE);
    expect((await page.goto('/scenes/new'))?.status()).toBe(403);
    await expect(page.getByRole('heading', { name: 'This page is for operators' })).toBeVisible();
    expect((await page.goto('/admin/users'))?.status()).toBe(403);
    await expect(page.getByText('403 · Not available for your role')).toBeVisible();
    // A page the role may see still answers 200.
    expect((await page.goto('/rigging'))?.status()).toBe(200);
  });
}

test('Harrow admin: Users nav, the organisation’s users only; adds an operator who sees approved scenes but not a colleague’s draft', async ({ page, browser }) => {
  await signIn(page, 'admin@harrow.example');
  await expect(whoAmI(page)).toContainText('Administrator');
  expect(await navLabels(page)).toEqual(['Scenes', 'Review', 'Notifications', 'Equipment', 'Rigging', 'Lessons', 'Users', 'Settings']);
  await expect(page.getByRole('link', { name: '+ New scene' })).toHaveCount(0);
  await mainNav(page).getByRole('link', { name: 'Users' }).click();
  await expect(page).toHaveURL(/\/admin\/users$/);
  const table = page.getByRole('table', { name: 'Users in your organisation' });
  for (const name of ['Dana Okafor', 'Mitch Varga', 'Priya Lindqvist', 'Sol Brennan']) await expect(table.getByText(name, { exact: true })).toBeVisible();
  await expect(table.getByText('Jules Amari')).toHaveCount(0);

  // The form uses the server's schema: a short password is refused before any request.
  await page.getByLabel('Name').fill('Rey Castillo');
  await page.getByLabel('E-mail').fill('rey@harrow.example');
  await page.getByLabel('First password').fill('short');
  await page.getByRole('button', { name: 'Add user' }).click();
  await expect(page.getByText('Password needs at least 12 characters')).toBeVisible();
  await page.getByLabel('First password').fill('rey-password-2026');
  await page.getByRole('button', { name: 'Add user' }).click();
  await expect(page.getByText('Rey Castillo (rey@harrow.example) can now sign in.')).toBeVisible();
  await expect(table.getByText('Rey Castillo', { exact: true })).toBeVisible();
  await screens(page, 'admin-users');

  const ctx = await browser.newContext();
  const rey = await ctx.newPage();
  await signIn(rey, 'rey@harrow.example', 'rey-password-2026');
  const titles = await listedTitles(rey);
  expect(titles).toContain(HARROW_SCENES.reefer);
  expect(titles).not.toContain(HARROW_SCENES.coil);
  await ctx.close();
});

test('Cobalt operator sees only Cobalt scenes; a Harrow scene id is not found', async ({ page }) => {
  await signIn(page, 'operator@cobalt.example');
  await expect(whoAmI(page)).toContainText('Jules Amari');
  await expect(whoAmI(page)).toContainText('Cobalt Flats Towing');
  expect(await listedTitles(page)).toEqual([COBALT_SCENE]);
  await expect(page.getByText(HARROW_SCENES.coil)).toHaveCount(0);

  // Scene 1 is a Harrow scene in the seeded database.
  const res = await page.goto('/scenes/1/details');
  expect(res?.status()).toBe(404);
  await expect(page.getByText(HARROW_SCENES.coil)).toHaveCount(0);
  await page.goto('/scenes');
  await sceneLink(page, COBALT_SCENE).waitFor();
  await page.getByRole('link', { name: `Details of ${COBALT_SCENE}` }).click();
  await expect(page.getByTestId('scene-title')).toHaveText(COBALT_SCENE);
});
