import { expect, test } from '@playwright/test';
import { HARROW_SCENES, createSceneViaApi, listedTitles, sceneLink, screens, signIn } from './helpers';

test('an operator creates a scene with a truck and finds it in the list', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await page.getByRole('link', { name: '+ New scene' }).click();
  await expect(page).toHaveURL(/\/scenes\/new$/);
  // Same schema as the server: a two-letter title is refused in the browser.
  await page.getByLabel('Title').fill('ab');
  await page.getByRole('button', { name: 'Create scene' }).click();
  await expect(page.getByText('Title needs at least 3 characters')).toBeVisible();
  await page.getByLabel('Title').fill('Jackknifed flatbed, Harlan Pass switchback');
  const truck = page.getByLabel('Truck profile (optional)');
  await expect(truck.locator('option', { hasText: 'HR-7' })).toHaveCount(1);
  await expect(truck.locator('option', { hasText: 'CF-2' })).toHaveCount(0);
  await truck.selectOption({ label: 'HR-7 — 50-ton rotator (example values)' });
  await screens(page, 'new-scene');
  await page.getByRole('button', { name: 'Create scene' }).click();

  // A new scene opens in the editor; its details page has the record.
  await expect(page).toHaveURL(/\/scenes\/\d+$/);
  await expect(page.getByTestId('plan-view')).toBeVisible();
  await page.goto(`${page.url()}/details`);
  await expect(page.getByTestId('scene-title')).toHaveText('Jackknifed flatbed, Harlan Pass switchback');
  await expect(page.getByTestId('scene-revision')).toHaveText('1');
  await expect(page.getByTestId('scene-audit')).toContainText('Dana Okafor — Created the scene as “Jackknifed flatbed, Harlan Pass switchback”');
  await expect(page.getByText('HR-7 — 50-ton rotator (example values) · profile version 1')).toBeVisible();
  await screens(page, 'scene-details');

  await page.getByRole('link', { name: '← All scenes' }).click();
  // Newest save first by default.
  await expect.poll(async () => (await listedTitles(page))[0]).toBe('Jackknifed flatbed, Harlan Pass switchback');
  await page.getByLabel(/^Search/).fill('harlan');
  await expect.poll(() => listedTitles(page)).toEqual(['Jackknifed flatbed, Harlan Pass switchback']);
  await page.getByLabel(/^Search/).fill('no such scene anywhere');
  await expect(page.getByText('No scenes match these filters')).toBeVisible();
  await screens(page, 'scenes-empty-filter', ['laptop', 'tablet-portrait']);
  await page.getByRole('button', { name: 'Clear filters' }).click();
  await expect(page.getByLabel(/^Search/)).toHaveValue('');
  await expect.poll(async () => (await listedTitles(page)).length).toBeGreaterThan(2);
});

test('the scene list sorts, filters by status and pages on the server', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  // Other suites add scenes too, so this works inside its own title filter: exactly 11 scenes, 10 a page.
  for (let i = 1; i <= 11; i++) await createSceneViaApi(page, `Paging check ${String(i).padStart(2, '0')}`);
  await page.reload();
  await page.getByLabel(/^Search/).fill('paging check');
  await expect(page.getByText('Showing 10 of 11 scenes')).toBeVisible();
  const before = await listedTitles(page);
  expect(before).toHaveLength(10);
  // Newest first by default: the last one created heads the list.
  expect(before[0]).toBe('Paging check 11');
  await page.getByRole('button', { name: 'Next →' }).click();
  await expect(page.getByText('Showing 1 of 11 scenes')).toBeVisible();
  expect(await listedTitles(page)).toEqual(['Paging check 01']);
  // The page is in the URL (a keyset cursor), so a shared link opens the same page.
  await expect(page).toHaveURL(/[?&]after=/);
  const shared = await page.context().newPage();
  await shared.goto(page.url());
  await expect.poll(() => listedTitles(shared)).toEqual(['Paging check 01']);
  await shared.close();
  await page.getByRole('button', { name: '← Previous' }).click();
  await expect.poll(async () => (await listedTitles(page))[0]).toBe('Paging check 11');

  await page.getByRole('button', { name: /^Title/ }).click();
  await expect(page.getByRole('columnheader', { name: /Title/ })).toHaveAttribute('aria-sort', 'ascending');
  await expect(page.getByText('Showing 10 of 11 scenes')).toBeVisible();
  await expect.poll(async () => (await listedTitles(page)).slice(0, 3)).toEqual(['Paging check 01', 'Paging check 02', 'Paging check 03']);
  await page.getByRole('button', { name: /^Title/ }).click();
  await expect(page.getByRole('columnheader', { name: /Title/ })).toHaveAttribute('aria-sort', 'descending');
  await expect.poll(async () => (await listedTitles(page))[0]).toBe('Paging check 11');

  await page.getByLabel(/^Search/).fill('');
  await page.getByLabel('Status').selectOption({ label: 'Approved' });
  // Other suites approve scenes of their own, so: the seeded approved plan is listed, and every row is approved.
  await expect.poll(() => listedTitles(page)).toContain(HARROW_SCENES.reefer);
  expect(await listedTitles(page)).not.toContain('Paging check 01');
  const statuses = await page.getByRole('table', { name: 'Scenes' }).locator('tbody tr td:nth-child(2)').allTextContents();
  expect(statuses.length).toBeGreaterThan(0);
  for (const s of statuses) expect(s).toMatch(/Approved/);
  await expect(page.getByText(/^Showing \d+ of \d+ scenes?$/)).toBeVisible();
});

test('a stale save shows the conflict message, and reloading lets the second tab save on top', async ({ browser }) => {
  const a = await (await browser.newContext()).newPage();
  const b = await (await browser.newContext()).newPage();
  await signIn(a, 'operator@harrow.example');
  await signIn(b, 'operator@harrow.example');
  const id = await createSceneViaApi(a, 'Rolled tanker, Fenwick interchange');
  await a.goto(`/scenes/${id}/details`);
  await b.goto(`/scenes/${id}/details`);
  await expect(b.getByTestId('scene-revision')).toHaveText('1');

  await a.getByLabel('Scene title').fill('Rolled tanker, Fenwick interchange (tab A)');
  await a.getByRole('button', { name: 'Save title' }).click();
  await expect(a.getByText('Saved as revision 2')).toBeVisible();

  await b.getByLabel('Scene title').fill('Rolled tanker, Fenwick interchange (tab B)');
  await b.getByRole('button', { name: 'Save title' }).click();
  await expect(b.getByText('Someone saved this scene after you opened it')).toBeVisible();
  await expect(b.getByText('You opened revision 1; the scene is now at revision 2. Your rename was not saved')).toBeVisible();
  await screens(b, 'scene-conflict');
  // Nothing was overwritten: tab A's title stands.
  const res = await b.request.get(`/api/scenes/${id}`);
  expect((await res.json()).title).toBe('Rolled tanker, Fenwick interchange (tab A)');

  await b.getByRole('button', { name: 'Reload the latest version' }).click();
  await expect(b.getByTestId('scene-title')).toHaveText('Rolled tanker, Fenwick interchange (tab A)');
  await expect(b.getByLabel('Scene title')).toHaveValue('Rolled tanker, Fenwick interchange (tab A)');
  await b.getByLabel('Scene title').fill('Rolled tanker, Fenwick interchange (tab B)');
  await b.getByRole('button', { name: 'Save title' }).click();
  await expect(b.getByText('Saved as revision 3')).toBeVisible();
  await expect(b.getByTestId('revision-history').locator('li')).toHaveCount(3);
  await expect(b.getByTestId('scene-title')).toHaveText('Rolled tanker, Fenwick interchange (tab B)');
  await a.context().close();
  await b.context().close();
});

test('someone else’s scene: the owner’s name, no rename form', async ({ page }) => {
  await signIn(page, 'supervisor@harrow.example');
  await page.getByLabel(/^Search/).fill('reefer');
  await page.getByRole('link', { name: `Details of ${HARROW_SCENES.reefer}` }).click();
  await expect(page.getByTestId('scene-title')).toHaveText(HARROW_SCENES.reefer);
  await expect(page.getByText('Only the owner, Dana Okafor, or an admin can change this scene.')).toBeVisible();
  await expect(page.getByLabel('Scene title')).toHaveCount(0);
  await expect(sceneLink(page, '← All scenes')).toBeVisible();
});
