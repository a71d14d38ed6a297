import { expect, test } from '@playwright/test';
import { HARROW_SCENES, sceneIdByTitle, screens, signIn } from './helpers';

test.use({ viewport: { width: 820, height: 1180 }, hasTouch: true });

test('portrait tablet: the editor bar is one row, its view controls sit in a labelled View menu', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await page.goto(`/scenes/${await sceneIdByTitle(page, HARROW_SCENES.coil)}`);
  await expect(page.getByTestId('plan-view')).toBeVisible();
  const bar = page.locator('header').first();
  // One row: every control's top within a few pixels of the first's, and the bar no taller than a row.
  const tops = await bar.evaluate((h) => [...h.children].filter((c) => (c as HTMLElement).offsetParent !== null).map((c) => Math.round(c.getBoundingClientRect().top)));
  expect(Math.max(...tops) - Math.min(...tops)).toBeLessThanOrEqual(8);
  expect((await bar.boundingBox())!.height).toBeLessThanOrEqual(64);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(820);

  await page.getByTestId('view-menu').click();
  const menu = page.getByRole('menu', { name: 'View' });
  await expect(menu).toBeVisible();
  const zoomBefore = await page.evaluate(() => window.__arclineEditor!.store.getState().camera.pxPerM);
  await menu.getByRole('menuitem', { name: /Zoom in/ }).click();
  await expect.poll(() => page.evaluate(() => window.__arclineEditor!.store.getState().camera.pxPerM)).toBeGreaterThan(zoomBefore);
  await screens(page, 'editor-view-menu', ['tablet-portrait']);
  await menu.getByRole('menuitem', { name: 'Gestures and keys' }).click();
  await expect(menu).toHaveCount(0);
  await expect(page.getByRole('dialog', { name: 'Keys and gestures' })).toBeVisible();
});

test('portrait tablet: the results drawer opens at a third, resizes by its grip and settles at a third, a half or two thirds', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await page.goto(`/scenes/${await sceneIdByTitle(page, HARROW_SCENES.coil)}`);
  const drawer = page.getByTestId('side-panel');
  await expect(drawer).toBeHidden();
  await page.getByTestId('open-panel').click();
  await expect(drawer).toBeVisible();
  const host = (await page.locator('[data-drawer-host]').boundingBox())!;
  const share = async () => (await drawer.boundingBox())!.width / host.width;
  // Opens at a third of the editor's width (never narrower than 300 px), so most of the plan stays in view.
  expect(Math.abs((await drawer.boundingBox())!.width - Math.max(300, host.width / 3))).toBeLessThanOrEqual(2);
  await screens(page, 'editor-drawer-third', ['tablet-portrait']);

  // Drag the grip left to about 55 % and let go: it settles at a half.
  const grip = (await page.getByTestId('drawer-grip').boundingBox())!;
  const y = grip.y + grip.height / 2;
  await page.mouse.move(grip.x + grip.width / 2, y);
  await page.mouse.down();
  await page.mouse.move(host.x + host.width * 0.45, y, { steps: 6 });
  await page.mouse.up();
  await expect.poll(share).toBeCloseTo(1 / 2, 2);
  // Further, to about 70 %: two thirds.
  const grip2 = (await page.getByTestId('drawer-grip').boundingBox())!;
  await page.mouse.move(grip2.x + grip2.width / 2, y);
  await page.mouse.down();
  await page.mouse.move(host.x + host.width * 0.3, y, { steps: 6 });
  await page.mouse.up();
  await expect.poll(share).toBeCloseTo(2 / 3, 2);
  await screens(page, 'editor-drawer-two-thirds', ['tablet-portrait']);
  // The keyboard steps back down: → to a half, → to a third.
  await page.getByTestId('drawer-grip').focus();
  await page.keyboard.press('ArrowRight');
  await expect.poll(share).toBeCloseTo(1 / 2, 2);
  await page.keyboard.press('ArrowRight');
  await expect.poll(async () => (await drawer.boundingBox())!.width).toBeCloseTo(Math.max(300, host.width / 3), 0);
});
