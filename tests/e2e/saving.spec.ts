import { expect, test, type APIRequestContext, type Browser, type Page } from '@playwright/test';
import { screens, signIn } from './helpers';
import { makePng } from '../fixtures/images';
import type { SceneDocument } from '@/lib/scene/schema';

// Saving journeys: autosave and conflicts, offline edits, the site image, export and import.
// Edits go through the live editor store (window.__arclineEditor) so these tests are about saving, not drawing.

const OPERATOR = 'operator@harrow.example';

async function newScene(request: APIRequestContext, title: string): Promise<number> {
  const res = await request.post('/api/scenes', { data: { title } });
  expect(res.status()).toBe(201);
  return (await res.json()).id;
}

async function sceneFromApi(request: APIRequestContext, id: number) {
  const res = await request.get(`/api/scenes/${id}`);
  expect(res.status()).toBe(200);
  return (await res.json()) as { id: number; title: string; revision: number; equipmentProfileId: number | null; document: SceneDocument };
}

async function openEditor(page: Page, id: number) {
  await page.goto(`/scenes/${id}`);
  await expect(page.getByTestId('plan-view')).toBeVisible();
  await page.waitForFunction(() => !!window.__arclineEditor);
}

/** One undoable edit: the grid spacing, a document field every scene has. */
async function setGrid(page: Page, metres: number) {
  await page.evaluate((m) => {
    window.__arclineEditor!.store.getState().run((doc) => ({ document: { ...doc, grid: m }, capture: 'commit' }));
  }, metres);
}

const status = (page: Page) => page.locator('[data-save-status]');

async function secondOperator(browser: Browser) {
  const context = await browser.newContext();
  const page = await context.newPage();
  await signIn(page, OPERATOR);
  return { context, page };
}

test('a save that lost the race shows the choice; both choices do what they say', async ({ page, browser }) => {
  await signIn(page, OPERATOR);
  const id = await newScene(page.request, 'Conflict check, Dock 4');
  await openEditor(page, id);
  // A truck on the plan, so the copy has a profile to keep.
  await page.locator('[data-tool="truck"]').click();
  await page.getByTestId('plan-view').click();
  await expect.poll(async () => (await sceneFromApi(page.request, id)).document.objects.some((o: { kind: string }) => o.kind === 'truck')).toBe(true);
  await expect(status(page)).toHaveAttribute('data-save-status', 'saved');

  // Someone else (a second browser context) saves first.
  const other = await secondOperator(browser);
  const base = await sceneFromApi(other.page.request, id);
  const put = await other.page.request.put(`/api/scenes/${id}`, { data: { revision: base.revision, document: { ...base.document, grid: 6.096 } } });
  expect(put.status()).toBe(200);

  await setGrid(page, 0.5);
  const dialog = page.getByRole('alertdialog', { name: 'Someone else saved this scene' });
  await expect(dialog).toBeVisible();
  await expect(status(page)).toHaveAttribute('data-save-status', 'conflict');
  await expect(status(page)).toContainText('Conflict');
  await screens(page, 'saving-conflict');

  // Reload theirs: their grid comes in, nothing of ours is saved.
  await dialog.getByRole('button', { name: /Reload their version/ }).click();
  await expect(dialog).toBeHidden();
  expect(await page.evaluate(() => window.__arclineEditor!.store.getState().document.grid)).toBe(6.096);
  await expect(status(page)).toHaveAttribute('data-save-status', 'saved');

  // Race again; this time keep ours as a copy.
  const now = await sceneFromApi(other.page.request, id);
  await other.page.request.put(`/api/scenes/${id}`, { data: { revision: now.revision, document: { ...now.document, grid: 9.144 } } });
  await setGrid(page, 0.75);
  await expect(dialog).toBeVisible();
  await dialog.getByRole('button', { name: /Keep mine as a copy/ }).click();
  await page.waitForURL((url) => url.pathname !== `/scenes/${id}` && /^\/scenes\/\d+$/.test(url.pathname));
  const copyId = Number(new URL(page.url()).pathname.split('/').pop());
  const copy = await sceneFromApi(page.request, copyId);
  expect(copy.title).toBe('Conflict check, Dock 4 (my copy)');
  expect(copy.document.grid).toBe(0.75);
  // The copy records the truck's profile, like the original.
  const truck = copy.document.objects.find((o) => o.kind === 'truck');
  expect(copy.equipmentProfileId).toBe(truck?.kind === 'truck' ? truck.profileId : 'no truck in the copy');
  expect((await sceneFromApi(page.request, id)).document.grid).toBe(9.144);
  await other.context.close();
});

test('an edit made offline is kept and saved when the connection returns', async ({ page, context }) => {
  await signIn(page, OPERATOR);
  const id = await newScene(page.request, 'Offline check, Quarry gate');
  await openEditor(page, id);
  const before = await sceneFromApi(page.request, id);

  await context.setOffline(true);
  await expect(status(page)).toHaveAttribute('data-save-status', 'offline');
  await setGrid(page, 2.5);
  await page.waitForTimeout(1500); // longer than the save debounce: nothing may be sent
  await expect(status(page)).toHaveAttribute('data-save-status', 'offline');
  await expect(status(page)).toContainText('Offline');
  await screens(page, 'saving-offline', ['laptop', 'tablet-portrait']);

  await context.setOffline(false);
  await expect(status(page)).toHaveAttribute('data-save-status', 'saved');
  const after = await sceneFromApi(page.request, id);
  expect(after.document.grid).toBe(2.5);
  expect(after.revision).toBe(before.revision + 1);
});

test('an unsaved edit survives closing the tab: the draft is restored and sent', async ({ page, context }) => {
  await signIn(page, OPERATOR);
  const id = await newScene(page.request, 'Draft check, Mill Creek');
  await openEditor(page, id);
  // The connection drops for saves only: the PUT never reaches the server. Routed on the context, so the
  // block covers every tab.
  await context.route(`**/api/scenes/${id}`, (route) => (route.request().method() === 'PUT' ? route.abort('internetdisconnected') : route.continue()));
  await setGrid(page, 4.2);
  await expect(status(page)).toHaveAttribute('data-save-status', 'offline');
  expect((await sceneFromApi(page.request, id)).document.grid).not.toBe(4.2);

  // The tab goes down with the edit unsaved (the device is offline, so its retries cannot reach the server: a
  // request sent by a page while Playwright closes or reloads it escapes the route's block). A new tab, with
  // saves still failing, gets the edit back from the IndexedDB draft, not from the server.
  await context.setOffline(true);
  await page.close({ runBeforeUnload: false });
  await context.setOffline(false);
  const again = await context.newPage();
  await openEditor(again, id);
  expect(await again.evaluate(() => window.__arclineEditor!.store.getState().document.grid)).toBe(4.2);
  expect((await sceneFromApi(again.request, id)).document.grid).not.toBe(4.2);

  // Connection back, reload once more: the restored draft is sent.
  await context.unroute(`**/api/scenes/${id}`);
  await openEditor(again, id);
  await expect(status(again)).toHaveAttribute('data-save-status', 'saved');
  await expect.poll(async () => (await sceneFromApi(again.request, id)).document.grid).toBe(4.2);
});

test('upload a site image, set its scale from two points, opacity and lock', async ({ page }) => {
  await signIn(page, OPERATOR);
  const id = await newScene(page.request, 'Site image check, Route 9');
  await openEditor(page, id);
  const panel = page.getByTestId('background-panel');
  if (!(await panel.isVisible())) await page.getByTestId('open-panel').click();
  await expect(panel).toBeVisible();
  await screens(page, 'saving-background-empty', ['laptop', 'tablet-portrait']);

  // A 400 x 300 "aerial": grey ground with a dark 320-pixel lane stripe to measure along.
  const png = Buffer.from(makePng(400, 300, (x, y) => (y >= 140 && y < 160 && x >= 40 && x < 360 ? [40, 44, 52] : [176, 170, 150])));
  await panel.getByTestId('background-file-input').setInputFiles({ name: 'aerial.png', mimeType: 'image/png', buffer: png });

  const dialog = page.getByRole('dialog', { name: 'Set the image scale' });
  await expect(dialog).toBeVisible();
  const image = dialog.getByRole('img', { name: 'Site background to calibrate' });
  await expect.poll(() => image.evaluate((el: HTMLImageElement) => el.naturalWidth)).toBe(400);
  const box = (await image.boundingBox())!;
  // Points A and B at image pixels (40, 150) and (360, 150): 320 pixels apart.
  await page.mouse.click(box.x + (40 / 400) * box.width, box.y + (150 / 300) * box.height);
  await page.mouse.click(box.x + (360 / 400) * box.width, box.y + (150 / 300) * box.height);
  await dialog.getByLabel(/Known distance/).fill(`40'`);
  await expect(dialog).toContainText('A–B is 320 image pixels');
  await screens(page, 'saving-calibrate');
  await dialog.getByRole('button', { name: 'Apply scale' }).click();
  await expect(dialog).toBeHidden();

  await panel.getByRole('slider').fill('80');
  await panel.getByRole('button', { name: 'Lock image' }).click();
  await expect(panel.getByRole('button', { name: 'Locked' })).toHaveAttribute('aria-pressed', 'true');
  await expect(status(page)).toHaveAttribute('data-save-status', 'saved');
  await screens(page, 'saving-background-set', ['laptop']);
  // On a tablet the panel slides over the plan when asked for.
  await page.setViewportSize({ width: 820, height: 1180 });
  await page.getByTestId('open-panel').click();
  await expect(panel).toBeVisible();
  await panel.scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'test-results/screens/saving-background-set-tablet-panel.png' });
  await page.setViewportSize({ width: 1366, height: 900 });

  const saved = await sceneFromApi(page.request, id);
  const bg = saved.document.background;
  if (!bg?.calibration) throw new Error('the saved scene has no calibrated background');
  // 40 ft = 12.192 m exactly (1 ft = 0.3048 m); over 320 px. Clicks land on whole screen pixels, so allow 1 %.
  expect(bg.metresPerPixel).toBeGreaterThan((12.192 / 320) * 0.99);
  expect(bg.metresPerPixel).toBeLessThan((12.192 / 320) * 1.01);
  expect(bg.calibration.distance).toBeCloseTo(12.192, 9);
  expect(bg.opacity).toBe(0.8);
  expect(bg.locked).toBe(true);

  const img = await page.request.get(`/api/scenes/${id}/background/${bg.uploadId}`);
  expect(img.status()).toBe(200);
  expect(img.headers()['content-type']).toBe('image/png');
  expect(Buffer.from(await img.body()).equals(png)).toBe(true);
});

test('export a scene to a file and import it as a new scene; a foreign file is refused by field', async ({ page }) => {
  await signIn(page, OPERATOR);
  const id = await newScene(page.request, 'Export check, Weigh station');
  await openEditor(page, id);
  await setGrid(page, 3.048);
  await expect(status(page)).toHaveAttribute('data-save-status', 'saved');

  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Export' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('export-check-weigh-station.arcline.json');
  const text = await (await file.createReadStream()).toArray().then((chunks) => Buffer.concat(chunks).toString('utf8'));
  const parsed = JSON.parse(text);
  expect(parsed).toMatchObject({ format: 'arcline-scene', formatVersion: 1, title: 'Export check, Weigh station' });
  expect(parsed.document.grid).toBe(3.048);

  // A file from somewhere else: nothing is created and the field is named.
  const wrong = JSON.stringify({ ...parsed, format: 'spreadsheet' });
  await page.getByTestId('scene-import-input').setInputFiles({ name: 'not-ours.json', mimeType: 'application/json', buffer: Buffer.from(wrong) });
  const refusal = page.getByRole('alertdialog', { name: /Could not import/ });
  await expect(refusal).toContainText('format');
  await expect(refusal).toContainText('not an Arcline scene file');
  await screens(page, 'saving-import-refused', ['laptop', 'tablet-portrait']);
  await refusal.getByRole('button', { name: 'Close' }).click();

  const renamed = JSON.stringify({ ...parsed, title: 'Imported weigh station plan' });
  await page.getByTestId('scene-import-input').setInputFiles({ name: 'plan.arcline.json', mimeType: 'application/json', buffer: Buffer.from(renamed) });
  await page.waitForURL((url) => url.pathname !== `/scenes/${id}` && /^\/scenes\/\d+$/.test(url.pathname));
  const newId = Number(new URL(page.url()).pathname.split('/').pop());
  const imported = await sceneFromApi(page.request, newId);
  expect(imported.title).toBe('Imported weigh station plan');
  expect(imported.revision).toBe(1);
  expect(imported.document).toEqual((await sceneFromApi(page.request, id)).document);
});
