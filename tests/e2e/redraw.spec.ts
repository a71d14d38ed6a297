import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, sceneIdByTitle, signIn, withSceneCopy } from './helpers';

/**
 * What moves with the slew is drawn on its own canvas: scrubbing the slew redraws only the top (live) layer,
 * never the scene's obstacles, trailer, truck body, tape or grid. Counted, not timed: each Konva layer's
 * drawScene is wrapped in the page and its calls are counted while the slew changes.
 */
async function countLayerDraws(page: Page) {
  await page.evaluate(() => {
    const K = (window as unknown as { Konva: { stages: { getLayers(): unknown[] }[]; Layer: { prototype: { drawScene: (...a: unknown[]) => unknown } } } }).Konva;
    const layers = K.stages[0]!.getLayers();
    const counts = layers.map(() => 0);
    const original = K.Layer.prototype.drawScene;
    K.Layer.prototype.drawScene = function (this: unknown, ...a: unknown[]) {
      const i = layers.indexOf(this);
      if (i >= 0) counts[i]! += 1;
      return original.apply(this, a);
    };
    (window as unknown as { __layerDraws: number[] }).__layerDraws = counts;
  });
  return async () => {
    // Two frames' grace, so a draw requested by the last change has happened.
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
    return page.evaluate(() => [...(window as unknown as { __layerDraws: number[] }).__layerDraws]);
  };
}

test('scrubbing the slew in the editor redraws only the live layer', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  // A copy of the coil transfer (it has a tape, obstacles, a trailer): scrubbing an editable scene saves the slew.
  await withSceneCopy(page, HARROW_SCENES.coil, 'Redraw check (coil copy)', async (id) => {
    await page.goto(`/scenes/${id}`);
    await expect(page.getByTestId('live-readout')).toBeVisible({ timeout: 30_000 });
    const slider = page.getByTestId('slew-slider');
    await slider.fill('10');
    const read = await countLayerDraws(page);
    for (let v = 11; v <= 40; v++) await slider.fill(String(v));
    const draws = await read();
    const live = draws[draws.length - 1]!;
    expect(live).toBeGreaterThanOrEqual(10);
    // Every layer under the live one (grid, scene) stays as it was drawn before the scrub.
    expect(draws.slice(0, -1)).toEqual(draws.slice(0, -1).map(() => 0));
  });
});

test('dragging the truck redraws the scene layer only as the drag starts and ends', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await withSceneCopy(page, HARROW_SCENES.coil, 'Redraw check, truck drag (coil copy)', async (id) => {
    await page.goto(`/scenes/${id}`);
    await expect(page.getByTestId('live-readout')).toBeVisible({ timeout: 30_000 });
    const box = (await page.getByTestId('plan-view').boundingBox())!;
    // The truck's reference point on screen, from the editor's own camera.
    const at = await page.evaluate(() => {
      const st = window.__arclineEditor!.store.getState();
      const t = st.document.objects.find((o) => o.kind === 'truck')!;
      return { x: st.viewport.width / 2 + (t.x - st.camera.x) * st.camera.pxPerM, y: st.viewport.height / 2 - (t.y - st.camera.y) * st.camera.pxPerM, x0: t.x };
    });
    const read = await countLayerDraws(page);
    await page.mouse.move(box.x + at.x, box.y + at.y);
    await page.mouse.down();
    for (let i = 1; i <= 20; i++) await page.mouse.move(box.x + at.x + 3 * i, box.y + at.y);
    const during = await read();
    await page.mouse.up();
    const after = await read();
    const moved = await page.evaluate(() => window.__arclineEditor!.store.getState().document.objects.find((o) => o.kind === 'truck')!.x);
    expect(moved).toBeGreaterThan(at.x0);
    const scene = during.length - 2;
    // The truck leaves the scene's canvas for the live one once, as it starts to move...
    expect(during[scene]).toBeLessThanOrEqual(1);
    expect(during[during.length - 1]!).toBeGreaterThanOrEqual(10);
    // ...and goes back once when it is set down. The grid never redraws.
    expect(after[scene]! - during[scene]!).toBe(1);
    expect(after.slice(0, scene)).toEqual(after.slice(0, scene).map(() => 0));
  });
});

test('playing the replay redraws only the live layer', async ({ page }) => {
  await signIn(page, 'trainer@harrow.example');
  const id = await sceneIdByTitle(page, HARROW_SCENES.reefer);
  await page.goto(`/scenes/${id}/replay`);
  await expect(page.getByTestId('replay-percent')).toBeVisible({ timeout: 30_000 });
  const read = await countLayerDraws(page);
  const slew = async () => (await page.getByTestId('replay-slew').textContent()) ?? '';
  const before = await slew();
  const forward = page.getByRole('button', { name: 'One degree forward' });
  for (let i = 0; i < 20; i++) await forward.click();
  await expect.poll(slew).not.toBe(before);
  const draws = await read();
  expect(draws[draws.length - 1]!).toBeGreaterThanOrEqual(5);
  expect(draws.slice(0, -1)).toEqual(draws.slice(0, -1).map(() => 0));
});
