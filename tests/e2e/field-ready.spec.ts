import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, screens, signIn } from './helpers';
import { CAUTION_LINES } from '@/lib/caution';
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

/** Ids and slugs that must never reach a reader: check ids ("bearing:FL:upper-weight"), generated object ids, kind slugs. */
const ID_PATTERN = /\b(?:bearing|stability|clearance|rigging|power-line|load-chart):\S+|\b(?:obstacle|trailer|truck|load|note|tape)-[a-z0-9]{5,}\b|\b(?:round-sling|web-sling|wire-rope-sling|snatch-block|recovery-strap)\b/;

test('the editor’s default view shows the caution beside the live readout and the results headline, and no result text carries an id', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  for (const title of [HARROW_SCENES.coil, HARROW_SCENES.reefer]) {
    const list = (await (await page.request.get(`/api/scenes?title=${encodeURIComponent(title)}`)).json()) as { items: { id: number; title: string }[] };
    await page.goto(`/scenes/${list.items.find((s) => s.title === title)!.id}`);
    await expect(page.getByTestId('live-readout')).toBeVisible();
    // Without a click: the caution sits in the bar with the readout.
    const bar = page.getByTestId('slew-bar');
    await expect(bar.getByTestId('caution-line')).toBeVisible();
    await expect(bar.getByTestId('caution-line')).toContainText("the manufacturer's load chart and manual govern");
    await bar.getByRole('button', { name: 'Full caution' }).click();
    await expect(bar.getByTestId('caution-line-full')).toContainText(CAUTION_LINES[1]);
    await page.getByTestId('tab-results').click();
    await expect(page.getByTestId('results-headline')).toBeVisible();
    await expect(page.getByTestId('results-summary').getByTestId('results-caution')).toBeVisible();
    if (title === HARROW_SCENES.coil) await screens(page, 'field-editor-results', ['laptop', 'tablet-portrait']);
    const texts = [await page.getByTestId('results-panel').innerText(), await page.getByTestId('live-readout').innerText()];
    // Every object's details, too.
    const ids = await page.evaluate(() => window.__arclineEditor!.store.getState().document.objects.map((o) => o.id));
    await page.getByTestId('tab-inspector').click();
    for (const id of ids) {
      await page.evaluate((sel) => window.__arclineEditor!.store.getState().set({ selection: [sel] }), id);
      texts.push(await page.getByRole('complementary', { name: 'Details and results' }).innerText());
    }
    for (const t of texts) expect(t).not.toMatch(ID_PATTERN);
    // A pad code appears only in brackets after the pad's name ("front jack (FJ)").
    expect(texts.join('\n').replace(/\([^)]*\)/g, '')).not.toMatch(/\b(?:FJ|FL|FR|RL|RR)\b/);
  }
});

test('on a tablet the details drawer opens at a third, resizes by its grip and snaps; Export and Import carry words', async ({ browser }) => {
  const context = await browser.newContext({ viewport: { width: 820, height: 1180 }, hasTouch: true });
  const page = await context.newPage();
  await signIn(page, 'operator@harrow.example');
  await openCoilCopy(page, 'Field check: drawer on a tablet');
  await expect(page.getByRole('button', { name: 'Export', exact: true }).first()).toHaveText('Export');
  await expect(page.getByRole('button', { name: 'Import', exact: true }).first()).toHaveText('Import');
  await page.getByTestId('open-panel').click();
  const panel = page.getByTestId('side-panel');
  const host = (await page.locator('[data-drawer-host]').boundingBox())!;
  const width = async () => (await panel.boundingBox())!.width;
  // A third of 820 px is below the drawer's 300 px floor.
  expect(Math.abs((await width()) - Math.max(300, host.width / 3))).toBeLessThan(2);
  const grip = (await page.getByTestId('drawer-grip').boundingBox())!;
  await page.mouse.move(grip.x + grip.width / 2, grip.y + grip.height / 2);
  await page.mouse.down();
  await page.mouse.move(host.x + host.width * 0.45, grip.y + grip.height / 2, { steps: 5 });
  await page.mouse.up();
  // Let go at 55 % of the width: it settles at a half.
  await expect.poll(width).toBeCloseTo(host.width / 2, 0);
  await screens(page, 'field-editor-drawer', ['tablet-portrait']);
  await context.close();
});
