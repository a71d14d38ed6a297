import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, VIEWPORTS, sceneIdByTitle, signIn } from './helpers';

/**
 * No page is wider than the screen, at laptop, tablet and phone widths: every page of the app a person can
 * reach from the navigation, for the roles that see it. (The full-screen editor, review and replay pages lay
 * out their own panes and are covered by their journeys.)
 */
test.describe.configure({ timeout: 240_000 });

const SIZES = [VIEWPORTS.laptop, VIEWPORTS['tablet-portrait'], VIEWPORTS.phone];

/** Pixels the page is wider than its viewport, and the widest element that pokes out (for the message). */
async function overflow(page: Page) {
  return page.evaluate(() => {
    const extra = document.documentElement.scrollWidth - document.documentElement.clientWidth;
    if (extra <= 0) return { extra, culprit: '' };
    const vw = document.documentElement.clientWidth;
    let culprit = '';
    let right = vw;
    // Inside a scroller (the phone's nav row, a wide table's card) an element may be wider: only the rest counts.
    const clipped = (el: Element) => {
      for (let a = el.parentElement; a && a !== document.body; a = a.parentElement) if (getComputedStyle(a).overflowX !== 'visible') return true;
      return false;
    };
    for (const el of document.body.querySelectorAll('*')) {
      const r = el.getBoundingClientRect();
      if (r.right > right + 0.5 && !clipped(el)) {
        right = r.right;
        culprit = `${el.tagName.toLowerCase()}.${String((el as HTMLElement).className).slice(0, 80)} (${Math.round(r.right)} px)`;
      }
    }
    return { extra, culprit };
  });
}

async function sweep(page: Page, paths: string[]) {
  const found: string[] = [];
  for (const size of SIZES) {
    await page.setViewportSize(size);
    for (const p of paths) {
      const res = await page.goto(p);
      expect(res?.status(), `${p} answers`).toBeLessThan(400);
      await page.waitForLoadState('networkidle');
      const o = await overflow(page);
      if (o.extra > 0) found.push(`${p} at ${size.width} px: ${o.extra} px too wide, ${o.culprit}`);
    }
  }
  expect(found).toEqual([]);
}

test('admin pages fit 1366, 820 and 390 px', async ({ page }) => {
  await signIn(page, 'admin@harrow.example');
  const coil = await sceneIdByTitle(page, HARROW_SCENES.coil);
  const profiles = (await (await page.request.get('/api/equipment')).json()) as { items: { id: number }[] };
  const rigging = (await (await page.request.get('/api/rigging')).json()) as { items: { id: number }[] };
  // The demo seeds truck profiles and rigging, so their own pages are in the sweep too.
  expect(profiles.items.length).toBeGreaterThan(0);
  expect(rigging.items.length).toBeGreaterThan(0);
  await sweep(page, [
    '/scenes', '/scenes/deleted', `/scenes/${coil}/details`, `/scenes/${coil}/plan`, '/equipment', '/equipment/new', `/equipment/${profiles.items[0].id}`,
    '/rigging', '/rigging/new', `/rigging/${rigging.items[0].id}`, '/lessons', '/notifications', '/settings', '/admin/users',
  ]);
});

test('operator, supervisor and trainer pages fit 1366, 820 and 390 px', async ({ browser }) => {
  for (const [email, paths] of [
    ['operator@harrow.example', ['/scenes', '/scenes/new', '/notifications', '/settings']],
    ['supervisor@harrow.example', ['/review', '/notifications']],
    ['trainer@harrow.example', ['/lessons', '/scenes?training=1']],
  ] as const) {
    const page = await (await browser.newContext()).newPage();
    await signIn(page, email);
    const all: string[] = [...paths];
    if (email.startsWith('trainer')) {
      // The demo seeds a lesson of three steps.
      const lessons = (await (await page.request.get('/api/lessons')).json()) as { items: { id: number }[] };
      expect(lessons.items.length).toBeGreaterThan(0);
      all.push(`/lessons/${lessons.items[0].id}`);
    }
    await sweep(page, all);
    await page.context().close();
  }
});

test('on a portrait tablet every navigation tab is in view, none hidden off the edge', async ({ page }) => {
  // The admin has the most tabs (Scenes, Review, Notifications, Equipment, Rigging, Lessons, Users, Settings).
  await signIn(page, 'admin@harrow.example');
  await page.setViewportSize(VIEWPORTS['tablet-portrait']);
  await page.goto('/scenes');
  const nav = page.getByRole('navigation', { name: 'Main' }).filter({ visible: true });
  const links = nav.getByRole('link');
  expect(await links.count()).toBeGreaterThanOrEqual(7);
  const width = VIEWPORTS['tablet-portrait'].width;
  for (const link of await links.all()) {
    const box = (await link.boundingBox())!;
    expect(box.x, `${await link.textContent()} starts on screen`).toBeGreaterThanOrEqual(0);
    expect(box.x + box.width, `${await link.textContent()} ends on screen`).toBeLessThanOrEqual(width);
  }
  // The list's rows keep their actions menu inside the table's card, not cut off at its edge.
  const table = page.getByRole('table', { name: 'Scenes' });
  await expect(table).toBeVisible();
  const card = (await table.evaluate((t) => {
    const r = (t.parentElement as HTMLElement).getBoundingClientRect();
    return { right: r.right };
  }))!;
  const menus = page.getByTestId('scene-row-actions').locator('summary');
  expect(await menus.count()).toBeGreaterThan(0);
  for (const m of (await menus.all()).slice(0, 3)) expect((await m.boundingBox())!.x + (await m.boundingBox())!.width).toBeLessThanOrEqual(card.right);
  await page.screenshot({ path: 'test-results/screens/nav-admin-tablet-portrait.png' });
});
