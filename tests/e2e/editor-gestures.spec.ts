import { expect, test, type Page } from '@playwright/test';
import { createSceneViaApi, screens, signIn } from './helpers';

/** Screen point (page pixels) of a site point, using the editor's own camera. */
async function screenOf(page: Page, p: { x: number; y: number }) {
  const box = (await page.getByTestId('plan-view').boundingBox())!;
  const s = await page.evaluate(([wx, wy]) => {
    const st = window.__arclineEditor!.store.getState();
    return { x: st.viewport.width / 2 + (wx - st.camera.x) * st.camera.pxPerM, y: st.viewport.height / 2 - (wy - st.camera.y) * st.camera.pxPerM };
  }, [p.x, p.y]);
  return { x: box.x + s.x, y: box.y + s.y };
}

const truckNow = (page: Page) =>
  page.evaluate(() => {
    const t = window.__arclineEditor!.store.getState().document.objects.find((o) => o.kind === 'truck')!;
    return { x: t.x, y: t.y, rotation: t.rotation };
  });
/** The inspector's compass heading for a stored rotation (° from east, counter-clockwise). */
const compass = (rotation: number) => Math.round((((90 - rotation) % 360) + 360) % 360) % 360;

test('turning or moving the truck shows its heading live beside it, gone on release', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  const id = await createSceneViaApi(page, `Heading readout ${Date.now()}`);
  await page.goto(`/scenes/${id}`);
  await page.locator('[data-tool="truck"]').click();
  const planBox = (await page.getByTestId('plan-view').boundingBox())!;
  const centre = { x: planBox.x + planBox.width / 2, y: planBox.y + planBox.height / 2 };
  await page.mouse.click(centre.x, centre.y);
  await expect(page.getByTestId('inspector-truck')).toBeVisible();
  const readout = page.getByTestId('gesture-readout');
  await expect(readout).toHaveCount(0);

  // Turn with the rotate handle, a quarter turn about the truck's reference point, in steps.
  const handle = await page.evaluate(() => window.__arclineEditor!.editor.handles().find((h) => h.kind === 'rotate')!.at);
  const t0 = await truckNow(page);
  const from = await screenOf(page, handle);
  const pivot = await screenOf(page, t0);
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  const r = Math.hypot(from.x - pivot.x, from.y - pivot.y);
  const a0 = Math.atan2(from.y - pivot.y, from.x - pivot.x);
  for (let i = 1; i <= 6; i++) {
    const a = a0 + (i / 6) * (Math.PI / 2);
    await page.mouse.move(pivot.x + r * Math.cos(a), pivot.y + r * Math.sin(a));
  }
  await expect(readout).toBeVisible();
  const turned = await truckNow(page);
  expect(compass(turned.rotation)).not.toBe(compass(t0.rotation));
  await expect(page.getByTestId('gesture-heading')).toHaveText(`Cab heading ${compass(turned.rotation)}°`);
  await expect(readout).toContainText('from north, clockwise');
  // The readout sits over (or under) the truck, clear of its reference point.
  const tag = (await readout.boundingBox())!;
  const at = await screenOf(page, turned);
  expect(Math.abs(tag.x + tag.width / 2 - at.x)).toBeLessThan(100);
  if ((await readout.getAttribute('data-side')) === 'above') expect(tag.y + tag.height).toBeLessThanOrEqual(at.y);
  else expect(tag.y).toBeGreaterThanOrEqual(at.y);
  await screens(page, 'editor-turning-readout', ['laptop', 'tablet-portrait']);
  await page.mouse.up();
  await expect(readout).toHaveCount(0);
  await expect(page.getByTestId('field-rotation')).toHaveValue(String(compass(turned.rotation)));

  // Moving: the position and the heading, in the user's units.
  const body = await screenOf(page, turned);
  await page.mouse.move(body.x, body.y);
  await page.mouse.down();
  await page.mouse.move(body.x + 40, body.y + 10, { steps: 4 });
  await page.mouse.move(body.x + 80, body.y + 20, { steps: 4 });
  await expect(readout).toBeVisible();
  await expect(readout).toContainText(/^E .+″ · N .+″/);
  await expect(page.getByTestId('gesture-heading')).toHaveText(`Cab heading ${compass(turned.rotation)}° from north`);
  await page.mouse.up();
  await expect(readout).toHaveCount(0);
  const moved = await truckNow(page);
  expect(moved.x).not.toBe(turned.x);
});
