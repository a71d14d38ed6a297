import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, signIn } from './helpers';
import { formatFeetInches } from '@/lib/format/quantity';

/** A copy of the demo coil transfer (a draft the operator may edit), opened in the editor. */
async function openCoilCopy(page: Page, title: string): Promise<number> {
  const list = (await (await page.request.get(`/api/scenes?title=${encodeURIComponent(HARROW_SCENES.coil)}`)).json()) as { items: { id: number; title: string }[] };
  const coil = await (await page.request.get(`/api/scenes/${list.items.find((s) => s.title === HARROW_SCENES.coil)!.id}`)).json();
  const res = await page.request.post('/api/scenes', { data: { title, document: coil.document, equipmentProfileId: coil.equipmentProfileId } });
  expect(res.status()).toBe(201);
  const id = (await res.json()).id as number;
  await page.goto(`/scenes/${id}`);
  await expect(page.getByTestId('plan-view')).toBeVisible();
  return id;
}

test('an outrigger typed past its reach shows the reach it is set to, with a notice, and the plan uses that figure', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await openCoilCopy(page, 'Field check: outrigger typed past its reach');
  await page.evaluate(() => {
    const s = window.__arclineEditor!.store.getState();
    s.set({ selection: [s.document.objects.find((o) => o.kind === 'truck')!.id] });
  });
  await expect(page.getByTestId('inspector-truck')).toBeVisible();
  const legs = await page.evaluate(() => window.__arclineEditor!.store.getState().truck!.legs.map((l) => ({ id: l.id, reach: l.full - l.retracted })));
  const leg = legs[0];
  const field = page.getByTestId(`ext-${leg.id}`);
  const typed = `${Math.ceil(leg.reach / 0.3048) + 1}' 3"`;
  // Whether or not the leg was fully out already, the box must not keep the typed figure.
  for (const start of [`2' 0"`, null]) {
    if (start) {
      await field.fill(start);
      await field.press('Enter');
      await expect(field).toHaveValue(`2′ 0″`);
    }
    await field.fill(typed);
    await field.press('Enter');
    await expect(field).toHaveValue(formatFeetInches(leg.reach));
    await expect(page.getByTestId(`ext-${leg.id}-message`)).toContainText(`this leg reaches 0′ 0″ – ${formatFeetInches(leg.reach)}`);
    const stored = await page.evaluate((id) => {
      const t = window.__arclineEditor!.store.getState().document.objects.find((o) => o.kind === 'truck');
      return t?.kind === 'truck' ? t.legs[id].extension : NaN;
    }, leg.id);
    expect(stored).toBeCloseTo(leg.reach, 9);
  }
  // A figure out of a refusing field's range names the range and keeps the plan's value.
  const elevation = page.getByTestId('field-elevation');
  const before = await elevation.inputValue();
  await elevation.fill('120');
  await elevation.press('Enter');
  await expect(elevation).toHaveValue(before);
  await expect(page.getByTestId('field-elevation-message')).toContainText('120 is out of range: this boom raises');
});
