import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, screens, signIn } from './helpers';
import { formatDate } from '@/lib/format/date';

interface Item {
  id: number;
  tag: string;
  kind: string;
  size: string;
  length: number | null;
  ratings: { vertical: number | null; choker: number | null; basket: number | null };
  status: string;
  lastInspection: string | null;
  nextInspectionDue: string | null;
  notes: string;
}

const pickOf = (it: Item) => ({ itemId: it.id, tag: it.tag, kind: it.kind, size: it.size, hitch: 'vertical', legs: 1, angleFromHorizontal: 90, ratingKg: it.ratings.vertical ?? it.ratings.basket ?? it.ratings.choker, ratings: it.ratings, massKg: 0 });

/** The demo coil transfer's id (other specs add scenes with "coil" in their titles). */
async function demoCoilId(page: Page): Promise<number> {
  const list = (await (await page.request.get(`/api/scenes?title=${encodeURIComponent(HARROW_SCENES.coil)}`)).json()) as { items: { id: number; title: string }[] };
  return list.items.find((s) => s.title === HARROW_SCENES.coil)!.id;
}

/** A copy of the demo coil transfer whose coil is rigged with the given picks, opened in the editor with the coil selected. */
async function openCoilCopy(page: Page, title: string, rigging: unknown[]) {
  const coil = await (await page.request.get(`/api/scenes/${await demoCoilId(page)}`)).json();
  const document = { ...coil.document, objects: coil.document.objects.map((o: { kind: string }) => (o.kind === 'load' ? { ...o, rigging } : o)) };
  const res = await page.request.post('/api/scenes', { data: { title, document, equipmentProfileId: coil.equipmentProfileId } });
  expect(res.status()).toBe(201);
  const id = (await res.json()).id as number;
  await page.goto(`/scenes/${id}`);
  await expect(page.getByTestId('plan-view')).toBeVisible();
  await page.evaluate(() => window.__arclineEditor!.store.getState().set({ selection: ['coil'] }));
  await expect(page.getByTestId('inspector-load')).toBeVisible();
  return id;
}

test('rigging picker: in-service items only, overdue inspections and tagged-out items said in words, a tagged-out item refused', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  const inventory = (await (await page.request.get('/api/rigging')).json()) as { items: Item[]; today: string };
  const byTag = (tag: string) => inventory.items.find((i) => i.tag === tag)!;
  const overdue = byTag('HR-RS-05');
  const taggedOut = byTag('HR-CH-02');
  expect(overdue.nextInspectionDue! < inventory.today).toBe(true);
  expect(taggedOut.status).toBe('tagged_out');

  await openCoilCopy(page, 'Rigging check: coil on an overdue sling and a tagged-out chain', [pickOf(overdue), pickOf(taggedOut)]);
  // Dates in the reader's locale, the app's one date format.
  const due = formatDate(overdue.nextInspectionDue!, await page.evaluate(() => navigator.language));
  await expect(page.getByTestId('rigging-row-HR-RS-05')).toContainText(`Inspection overdue since ${due}`);
  await expect(page.getByTestId('rigging-row-HR-CH-02')).toContainText('Tagged out: remove it from the plan');
  await expect(page.getByTestId('rigging-row-HR-RS-05')).not.toContainText('Tagged out');

  // Only in-service items are offered; the overdue one is offered with its date.
  const select = page.getByTestId('rigging-add-select');
  const options = await select.locator('option').allTextContents();
  expect(options.some((o) => o.startsWith('HR-CH-02'))).toBe(false);
  expect(options).toContain(`HR-RS-05 · Round sling blue · inspection overdue since ${due}`);
  expect(options.length - 1).toBe(inventory.items.filter((i) => i.status === 'in_service').length);

  // An overdue item goes in, with the warning in view.
  await select.selectOption({ label: options.find((o) => o.startsWith('HR-RS-05'))! });
  await page.getByRole('button', { name: 'Add', exact: true }).click();
  await expect(page.getByTestId('rigging-add-notice')).toHaveText(`HR-RS-05 added, but its inspection has been overdue since ${due}: have it inspected before the lift.`);
  await expect(page.locator('[data-testid="rigging-row-HR-RS-05"]')).toHaveCount(2);
  await screens(page, 'editor-load-rigging', ['laptop', 'tablet-portrait']);

  // A recovery strap is not lifting rigging: it is offered with that said, and refused with the reason.
  expect(options).toContain('HR-ST-01 · Recovery strap 100 mm × 9 m (example) · not lifting rigging');
  await select.selectOption({ label: options.find((o) => o.startsWith('HR-ST-01'))! });
  await page.getByRole('button', { name: 'Add', exact: true }).click();
  await expect(page.getByTestId('rigging-add-notice')).toHaveText(/^HR-ST-01 is not lifting rigging and cannot be added to a lift plan: A recovery strap is made for pulling/);
  await expect(page.getByTestId('rigging-row-HR-ST-01')).toHaveCount(0);

  // An item tagged out after the list was loaded is refused when added, with the reason.
  const web = byTag('HR-WS-01');
  const { id: _id, ...body } = web;
  await select.selectOption({ label: options.find((o) => o.startsWith('HR-WS-01'))! });
  const put = await page.request.put(`/api/rigging/${web.id}`, { data: { ...body, status: 'tagged_out' } });
  expect(put.ok()).toBe(true);
  try {
    await page.getByRole('button', { name: 'Add', exact: true }).click();
    await expect(page.getByTestId('rigging-add-notice')).toHaveText('HR-WS-01 is tagged out and cannot be added to a plan.');
    await expect(page.getByTestId('rigging-row-HR-WS-01')).toHaveCount(0);
    const doc = await page.evaluate(() => window.__arclineEditor!.store.getState().document.objects.find((o) => o.kind === 'load'));
    expect((doc as { rigging: { tag: string }[] }).rigging.map((r) => r.tag)).toEqual(['HR-RS-05', 'HR-CH-02', 'HR-RS-05']);
    // The list is refreshed: the web sling is no longer offered.
    await expect(select.locator('option', { hasText: 'HR-WS-01' })).toHaveCount(0);
  } finally {
    const back = await page.request.put(`/api/rigging/${web.id}`, { data: body });
    expect(back.ok()).toBe(true);
  }
});

test('results panel: in the imperial view every check sentence is in feet-inches, pounds and psf', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await page.goto(`/scenes/${await demoCoilId(page)}`);
  await page.getByTestId('tab-results').click();
  await expect(page.getByTestId('results-summary')).toBeVisible();
  const sentences = page.locator('[data-testid^="check-sentence-"]');
  await expect(sentences.first()).toBeVisible();
  const texts = await sentences.allTextContents();
  expect(texts.length).toBeGreaterThan(5);
  for (const t of texts) expect(t).not.toMatch(/\d (m|kg|kPa|kN)(?![\p{L}\p{N}])/u);
  const bearing = texts.find((t) => / pad presses /.test(t));
  expect(bearing).toMatch(/^The (left|right) (front|rear) pad presses [\d,]+ psf on the ground .* allowable [\d,]+ psf/);
  // Names, never ids: no object id or check id reaches the words.
  for (const t of texts) expect(t).not.toMatch(/obstacle-[a-z0-9]{4,}|trailer-[a-z0-9]{4,}|[a-z-]+:[A-Z]{1,4}(:|\b)/);
  // The sentence agrees with its own value column.
  const bearingRow = page.locator('[data-testid^="check-bearing:"]').first();
  const value = (await bearingRow.getByTestId('check-value').textContent())!;
  await expect(bearingRow.locator('[data-testid^="check-sentence-"]')).toContainText(`presses ${value}`);
  await screens(page, 'editor-results-imperial', ['laptop', 'tablet-portrait']);
});
