import { expect, type Page } from '@playwright/test';

export const PASSWORD = 'arcline-demo-2026';

export const HARROW_SCENES = { coil: 'Coil transfer, Route 9 weigh station', reefer: 'Overturned reefer trailer, Mill Creek on-ramp' } as const;
export const COBALT_SCENE = 'Box truck up the embankment, Quarry Road';

export const VIEWPORTS = {
  laptop: { width: 1366, height: 900 },
  'tablet-portrait': { width: 820, height: 1180 },
  'tablet-landscape': { width: 1180, height: 820 },
  phone: { width: 390, height: 844 },
} as const;

export async function signIn(page: Page, email: string, password = PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/scenes$/);
}

/** The visible "who is signed in" block (sidebar on a laptop, top bar on a portrait tablet). */
export const whoAmI = (page: Page) => page.getByTestId('who-am-i').filter({ visible: true });

export const sceneLink = (page: Page, title: string) => page.getByRole('link', { name: title, exact: true });

/** Scene titles in the list table, in order, once the table has loaded. */
export async function listedTitles(page: Page) {
  const table = page.getByRole('table', { name: 'Scenes' });
  await expect(table.getByText('Loading…')).toHaveCount(0);
  return table.locator('tbody tr td:first-child a').allTextContents();
}

/** A scene's id from its title, through the list API with the page's session. */
export async function sceneIdByTitle(page: Page, title: string): Promise<number> {
  const list = (await (await page.request.get(`/api/scenes?title=${encodeURIComponent(title)}`)).json()) as { items: { id: number; title: string }[] };
  return list.items.find((s) => s.title === title)!.id;
}

/**
 * Copies a seeded scene through the API (so a test may edit it freely), runs `body` with the copy's id, and
 * deletes the copy afterwards, whether `body` passed or failed.
 */
export async function withSceneCopy(page: Page, sourceTitle: string, copyTitle: string, body: (id: number) => Promise<void>): Promise<void> {
  const source = await sceneIdByTitle(page, sourceTitle);
  const copy = await page.request.post(`/api/scenes/${source}/duplicate`, { data: { title: copyTitle } });
  expect(copy.status()).toBe(201);
  const id = (await copy.json()).id as number;
  try {
    await body(id);
  } finally {
    expect((await page.request.delete(`/api/scenes/${id}`)).status()).toBeLessThan(300);
  }
}

/** Creates a scene through the API with the page's session (for setting up a test, not for the journey under test). */
export async function createSceneViaApi(page: Page, title: string): Promise<number> {
  const res = await page.request.post('/api/scenes', { data: { title } });
  expect(res.status()).toBe(201);
  return (await res.json()).id as number;
}

/**
 * Saves full-page screenshots of the current screen at the laptop and tablet viewports into
 * test-results/screens/, then puts the viewport back.
 */
export async function screens(page: Page, name: string, which: (keyof typeof VIEWPORTS)[] = ['laptop', 'tablet-portrait', 'tablet-landscape']) {
  const original = page.viewportSize();
  for (const v of which) {
    await page.setViewportSize(VIEWPORTS[v]);
    await page.waitForTimeout(200);
    await page.screenshot({ path: `test-results/screens/${name}-${v}.png`, fullPage: true });
  }
  if (original) await page.setViewportSize(original);
}
