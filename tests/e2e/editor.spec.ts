import { expect, test, type Page } from '@playwright/test';
import { createSceneViaApi, screens, signIn } from './helpers';
import { parseSceneDocument } from '@/lib/scene/parse';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import { analyzeLift } from '@/lib/lift';
import { describeCheck } from '@/lib/format/checks';

/** Screen point (inside the plan view) of a site point, using the editor's own camera. */
async function screenOf(page: Page, x: number, y: number) {
  const box = (await page.getByTestId('plan-view').boundingBox())!;
  const p = await page.evaluate(([wx, wy]) => {
    const s = window.__arclineEditor!.store.getState();
    return { x: s.viewport.width / 2 + (wx - s.camera.x) * s.camera.pxPerM, y: s.viewport.height / 2 - (wy - s.camera.y) * s.camera.pxPerM };
  }, [x, y]);
  return { x: box.x + p.x, y: box.y + p.y };
}

async function clickSite(page: Page, x: number, y: number) {
  const p = await screenOf(page, x, y);
  await page.mouse.click(p.x, p.y);
}

const storeDoc = (page: Page) => page.evaluate(() => JSON.parse(JSON.stringify(window.__arclineEditor!.store.getState().document)));

async function savedDoc(page: Page, id: number) {
  const res = await page.request.get(`/api/scenes/${id}`);
  expect(res.ok()).toBe(true);
  return (await res.json()) as { document: unknown; revision: number };
}

test('sketch a lift from scratch, read the results, and find the same scene after a reload', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  const id = await createSceneViaApi(page, 'Editor journey: coil off a flatbed');
  await page.goto(`/scenes/${id}`);
  await expect(page.getByTestId('plan-view')).toBeVisible();
  await expect(page.getByText('Place the truck (T) to slew the boom')).toBeVisible();
  await screens(page, 'editor-empty');

  await page.locator('[data-tool="truck"]').click();
  await clickSite(page, 0, 0);
  await expect(page.getByTestId('inspector-truck')).toBeVisible();
  // Pads: cribbing under the front left pad, and the rear right leg partly in.
  await page.getByTestId('crib-FL').fill(`4' 0"`);
  await page.getByTestId('crib-FL').press('Enter');
  await page.getByTestId('ext-RR').fill(`4' 0"`);
  await page.getByTestId('ext-RR').press('Enter');
  await page.keyboard.press('f');

  await page.locator('[data-tool="load"]').click();
  await page.locator('[data-tool="load-coil"]').click();
  await clickSite(page, 0, -6.1);
  await expect(page.getByTestId('inspector-load')).toBeVisible();
  await page.locator('[data-tool="trailer"]').click();
  await clickSite(page, -3, 7.6);
  await page.getByTestId('field-deck-height').fill(`5' 0"`);
  await page.getByTestId('field-deck-height').press('Enter');
  await page.locator('[data-tool="obstacle"]').click();
  await page.locator('[data-tool="obstacle-rect"]').click();
  await clickSite(page, 9.1, 6.1);
  await page.getByTestId('field-height').fill(`12' 0"`);
  await page.getByTestId('field-height').press('Enter');

  // Nothing selected: the scene's swing plan.
  await page.getByTestId('field-height').blur();
  await page.keyboard.press('Escape');
  await expect(page.getByTestId('scene-settings')).toBeVisible();
  await page.getByTestId('field-pick').fill('270');
  await page.getByTestId('field-pick').press('Enter');
  await page.getByTestId('field-set').fill('100');
  await page.getByTestId('field-set').press('Enter');
  await page.getByTestId('field-direction').selectOption('cw');
  await page.keyboard.press('f');

  await page.getByTestId('tab-results').click();
  await expect(page.getByTestId('worst-percent')).toBeVisible();
  await screens(page, 'editor-results');

  // Wait for the autosave to hold what the store holds.
  const local = await storeDoc(page);
  await expect.poll(async () => (await savedDoc(page, id)).document, { timeout: 15_000 }).toEqual(local);

  const worstText = (await page.getByTestId('worst-percent').textContent())!;
  const obstacleId = local.objects.find((o: { kind: string }) => o.kind === 'obstacle').id as string;
  const clearance = page.getByTestId(`check-clearance:${obstacleId}`);
  await expect(clearance).toBeVisible();
  const clearanceReason = (await clearance.locator('p').textContent())!;

  // The engine in node, on the saved document, with the truck profile it names.
  const saved = parseSceneDocument((await savedDoc(page, id)).document);
  expect(saved.ok).toBe(true);
  if (!saved.ok) return;
  const truck = saved.document.objects.find((o) => o.kind === 'truck')!;
  if (truck.kind !== 'truck') return;
  const profile = await (await page.request.get(`/api/equipment/${truck.profileId}`)).json();
  const model = truckModelFromProfile({ id: profile.id, version: truck.profileVersion, name: profile.name, unitNumber: profile.unitNumber, spec: profile.spec });
  const lift = sceneToLiftInput(saved.document, model);
  expect(lift.ok).toBe(true);
  if (!lift.ok) return;
  const result = analyzeLift(lift.input);
  expect(worstText).toBe(`${result.worstCase.percentOfTipping.toFixed(1)} %`);
  expect(await page.getByTestId('worst-slew').textContent()).toBe(`${result.worstCase.slew.toFixed(1)}°`);
  const engineClearance = result.checks.find((c) => c.id === `clearance:${obstacleId}`)!;
  // The engine's record, written by the one formatter in the operator's units (imperial by default).
  expect(clearanceReason).toBe(describeCheck(engineClearance, 'imperial').sentence);
  expect(clearanceReason).toContain('′');
  expect(saved.document.swing).toEqual({ from: 270, to: 100, direction: 'cw' });

  // Scrub the slew with the keyboard: the readout follows.
  await page.getByTestId('plan-view').click({ position: { x: 5, y: 5 } });
  const before = await page.getByTestId('slew-value').textContent();
  await page.keyboard.press('Shift+ArrowLeft');
  await expect(page.getByTestId('slew-value')).not.toHaveText(before!);
  await expect(page.getByTestId('live-readout')).toContainText('% of tipping about');
  const scrubbed = await storeDoc(page);
  await expect.poll(async () => (await savedDoc(page, id)).document, { timeout: 15_000 }).toEqual(scrubbed);

  const beforeReload = await storeDoc(page);
  await page.reload();
  await expect(page.getByTestId('plan-view')).toBeVisible();
  await expect.poll(async () => await storeDoc(page)).toEqual(beforeReload);
  await page.getByTestId('tab-results').click();
  await expect(page.getByTestId('worst-percent')).toHaveText(worstText);

  await page.keyboard.press('?');
  await expect(page.getByRole('dialog', { name: 'Keys and gestures' })).toBeVisible();
  await screens(page, 'editor-help', ['laptop', 'tablet-portrait']);
  await page.keyboard.press('Escape');
});

test('the demo coil transfer opens with its swing check drawn, and a supervisor sees it read-only', async ({ page, browser }) => {
  await signIn(page, 'operator@harrow.example');
  const list = await (await page.request.get('/api/scenes?title=Coil')).json();
  const id = list.items[0].id as number;
  await page.goto(`/scenes/${id}`);
  await page.getByTestId('tab-results').click();
  await expect(page.getByTestId('results-summary')).toBeVisible();
  await screens(page, 'editor-demo-coil');
  await page.getByTestId('tab-inspector').click();
  await clickSite(page, 0, 0.5);
  await expect(page.getByTestId('inspector-truck')).toBeVisible();
  await screens(page, 'editor-truck-selected');

  const sup = await browser.newContext({ viewport: { width: 1366, height: 900 } });
  const other = await sup.newPage();
  await signIn(other, 'supervisor@harrow.example');
  await other.goto(`/scenes/${id}`);
  await expect(other.getByText('Read-only: you can look and scrub the slew, not edit')).toBeVisible();
  await expect(other.locator('[data-tool="truck"]')).toHaveCount(0);
  const doc0 = JSON.stringify(await storeDoc(other));
  await other.getByTestId('plan-view').click({ position: { x: 5, y: 5 } });
  await other.keyboard.press('Shift+ArrowLeft');
  await other.keyboard.press('Delete');
  expect(JSON.stringify(await storeDoc(other))).toBe(doc0);
  await screens(other, 'editor-read-only', ['laptop', 'tablet-portrait']);
  await sup.close();
});

test('tablet with touch: tap to place, drag with a finger, pinch to zoom', async ({ browser }) => {
  const context = await browser.newContext({ viewport: { width: 1180, height: 820 }, hasTouch: true, isMobile: false });
  const page = await context.newPage();
  await signIn(page, 'operator@harrow.example');
  const id = await createSceneViaApi(page, 'Editor on a tablet');
  await page.goto(`/scenes/${id}`);
  await expect(page.getByTestId('plan-view')).toBeVisible();
  await page.locator('[data-tool="truck"]').tap();
  let p = await screenOf(page, 0, 0);
  await page.touchscreen.tap(p.x, p.y);
  await expect.poll(async () => (await storeDoc(page)).objects.length).toBe(1);
  await page.locator('[data-tool="note"]').tap();
  p = await screenOf(page, 6, 6);
  await page.touchscreen.tap(p.x, p.y);
  await expect.poll(async () => (await storeDoc(page)).objects.length).toBe(2);

  // Two fingers apart: zoom grows; the document stays as it was.
  const zoom = async () => Number((await page.getByTestId('zoom').textContent())!.replace('%', ''));
  const z0 = await zoom();
  const doc0 = JSON.stringify(await storeDoc(page));
  await page.getByTestId('plan-view').evaluate((el) => {
    const r = el.getBoundingClientRect();
    const cx = r.left + r.width / 2;
    const cy = r.top + r.height / 2;
    const fire = (type: string, id: number, x: number) =>
      el.dispatchEvent(new PointerEvent(type, { pointerId: id, pointerType: 'touch', clientX: x, clientY: cy, bubbles: true, isPrimary: id === 11 }));
    fire('pointerdown', 11, cx - 40);
    fire('pointerdown', 12, cx + 40);
    for (let i = 1; i <= 10; i++) {
      fire('pointermove', 11, cx - 40 - i * 8);
      fire('pointermove', 12, cx + 40 + i * 8);
    }
    fire('pointerup', 11, cx - 120);
    fire('pointerup', 12, cx + 120);
  });
  await expect.poll(zoom).toBeGreaterThan(z0 * 1.8);
  expect(JSON.stringify(await storeDoc(page))).toBe(doc0);
  await screens(page, 'editor-tablet-touch', ['tablet-landscape', 'tablet-portrait']);
  await context.close();
});
