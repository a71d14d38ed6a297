import { expect, test, type Page } from '@playwright/test';
import { screens, signIn } from './helpers';

/** Pastes text into an element the way a spreadsheet copy arrives: a paste event carrying text/plain. */
async function pasteInto(page: Page, selector: string, text: string) {
  await page.locator(selector).evaluate((el, t) => {
    const dt = new DataTransfer();
    dt.setData('text/plain', t);
    el.dispatchEvent(new ClipboardEvent('paste', { clipboardData: dt, bubbles: true, cancelable: true }));
  }, text);
}

test('an admin builds a truck profile from scratch, pastes its load chart and sees the drawing follow', async ({ page }) => {
  await signIn(page, 'admin@harrow.example');
  await page.goto('/equipment');
  await expect(page.getByText('Example values').first()).toBeVisible();
  await screens(page, 'equipment-list-admin');
  await page.getByRole('link', { name: '+ New profile' }).click();
  await expect(page).toHaveURL(/\/equipment\/new$/);

  await page.getByLabel('Unit number').fill('HR-9');
  await page.getByLabel('Name', { exact: true }).fill('Shop rotator (example values)');
  // The long form opens on Identity alone; a section opens from its heading.
  const carrier = page.getByRole('button', { name: 'Carrier', exact: true });
  await expect(carrier).toHaveAttribute('aria-expanded', 'false');
  await expect(page.getByRole('textbox', { name: 'Overall length' })).toHaveCount(0);
  await carrier.click();
  await expect(carrier).toHaveAttribute('aria-expanded', 'true');
  const drawingLength = page.getByTestId('drawing-length');
  await expect(drawingLength).toHaveText('Overall length 32′ 10″');
  // Imperial is the default: type feet and inches, and the drawing redraws as you type.
  await page.getByRole('textbox', { name: 'Overall length' }).fill(`36' 1"`);
  await expect(drawingLength).toHaveText('Overall length 36′ 1″');
  await page.getByRole('textbox', { name: 'Overall length' }).fill('40');
  await expect(drawingLength).toHaveText('Overall length 40′ 0″');
  await page.getByRole('textbox', { name: 'Front edge' }).last().fill('40');

  // Saving with the empty starter chart is refused with the row named, and the closed Load chart section opens.
  await expect(page.getByRole('button', { name: 'Load chart', exact: true })).toHaveAttribute('aria-expanded', 'false');
  await page.getByRole('button', { name: 'Create profile' }).click();
  await expect(page.getByTestId('chart-errors')).toContainText('has no rated loads');
  await expect(page.getByRole('button', { name: 'Load chart', exact: true })).toHaveAttribute('aria-expanded', 'true');

  // Boom 19.7 ft (the starter's 6 m stage); radii 10 and 15 ft; rated loads in lb.
  await pasteInto(page, '#chart-paste', '\t19.7\n10\t20000\n15\t15000\n');
  await expect(page.getByLabel('Radius, row 2')).toHaveValue(`15′ 0″`);
  await expect(page.getByLabel('Rated load at row 1, column 1')).toHaveValue('20000');
  await screens(page, 'equipment-new-filled');
  await page.getByRole('button', { name: 'Create profile' }).click();
  await expect(page).toHaveURL(/\/equipment\/\d+\?created=1$/);
  await expect(page.getByText('Profile saved as version 1.')).toBeVisible();
  await page.getByRole('button', { name: 'Open all sections' }).click();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('HR-9 · Shop rotator (example values)');
  await expect(page.getByTestId('drawing-length')).toHaveText('Overall length 40′ 0″');

  // The stored numbers are SI: 40 ft = 12.192 m, 20 000 lb = 9 071.847 kg.
  const id = page.url().match(/equipment\/(\d+)/)![1];
  const saved = await (await page.request.get(`/api/equipment/${id}`)).json();
  expect(saved.spec.carrier.length).toBeCloseTo(12.192, 9);
  expect(saved.spec.loadChart.rated[0][0]).toBeCloseTo(9071.847, 3);

  // A second save keeps a new version in the history.
  await page.getByRole('textbox', { name: 'Overall width' }).fill(`8' 4"`);
  await page.getByRole('button', { name: 'Save new version' }).click();
  await expect(page.getByText('Saved as version 2.')).toBeVisible();
  await page.reload();
  await expect(page.getByTestId('version-history').getByRole('listitem')).toHaveCount(2);
  await page.getByRole('link', { name: 'Version 1' }).click();
  await expect(page.getByText('Viewing version 1')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Save new version' })).toHaveCount(0);
  await screens(page, 'equipment-version-view');
});

test('the load chart grid scrolls inside its section, with its headings in view; the form is far shorter closed', async ({ page }) => {
  await signIn(page, 'admin@harrow.example');
  await page.goto('/equipment');
  await page.getByRole('link', { name: /HR-7/ }).click();
  const closedHeight = await page.evaluate(() => document.documentElement.scrollHeight);
  await page.getByRole('link', { name: 'Load chart', exact: true }).click();
  await expect(page.getByRole('button', { name: 'Load chart', exact: true })).toHaveAttribute('aria-expanded', 'true');
  // A taller, wider chart than any column can show: twelve more radius rows and four more boom columns.
  for (let i = 0; i < 12; i++) await page.getByRole('button', { name: '+ Radius row' }).click();
  for (let i = 0; i < 4; i++) await page.getByRole('button', { name: '+ Boom column' }).click();
  const scroller = page.getByTestId('load-chart-scroller');
  const box = await scroller.evaluate((el) => ({ scrollW: el.scrollWidth, clientW: el.clientWidth, scrollH: el.scrollHeight, clientH: el.clientHeight, sectionW: el.closest('section')!.clientWidth }));
  expect(box.scrollH).toBeGreaterThan(box.clientH);
  expect(box.scrollW).toBeGreaterThan(box.clientW);
  expect(box.clientW).toBeLessThanOrEqual(box.sectionW);
  // The page itself does not widen.
  expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
  // Scrolled to the far corner, the boom-length row and the radius column stay in view.
  await scroller.evaluate((el) => el.scrollTo(el.scrollWidth, el.scrollHeight));
  const inView = async (label: string) => {
    const r = await page.getByLabel(label).boundingBox();
    const s = await scroller.boundingBox();
    return !!r && !!s && r.y >= s.y - 1 && r.y + r.height <= s.y + s.height + 1 && r.x >= s.x - 1 && r.x + r.width <= s.x + s.width + 1;
  };
  // Column 1 has scrolled out sideways and row 1 upwards; the sticky headings have not.
  expect(await inView('Boom length, column 1')).toBe(false);
  expect(await inView('Rated load at row 1, column 5')).toBe(false);
  const rows = await page.getByLabel(/^Radius, row \d+$/).count();
  const cols = await page.getByLabel(/^Boom length, column \d+$/).count();
  expect(rows).toBeGreaterThanOrEqual(13);
  expect(await inView(`Radius, row ${rows}`)).toBe(true);
  expect(await inView(`Boom length, column ${cols}`)).toBe(true);
  expect(await inView(`Rated load at row ${rows}, column ${cols}`)).toBe(true);
  await screens(page, 'equipment-load-chart-scrolled', ['laptop', 'tablet-portrait', 'phone']);
  // Everything closed is a fraction of the open form's height.
  await page.getByRole('button', { name: 'Open all sections' }).click();
  const openHeight = await page.evaluate(() => document.documentElement.scrollHeight);
  expect(closedHeight * 2).toBeLessThan(openHeight);
});

test('an operator reads a profile but cannot edit it', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await page.goto('/equipment');
  await expect(page.getByRole('link', { name: '+ New profile' })).toHaveCount(0);
  await page.getByRole('link', { name: /HR-7/ }).click();
  await expect(page.getByText('Read only')).toBeVisible();
  await expect(page.getByRole('button', { name: 'Save new version' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Duplicate' })).toHaveCount(0);
  // Reading, the sections still open and close; the fields inside stay read-only.
  await page.getByRole('button', { name: 'Carrier', exact: true }).click();
  await expect(page.getByRole('textbox', { name: 'Overall length' })).toBeDisabled();
  await expect(page.getByTestId('drawing-length')).toHaveText('Overall length 40′ 0″');
  // The drawing's pad codes are explained under it.
  await expect(page.getByTestId('drawing-pad-key')).toHaveText('Pads: FL left front · FR right front · RL left rear · RR right rear · FJ front jack');
  // No two words on the drawing overlap (the scale bar once sat on the right rear pad's code).
  const overlaps = await page.getByTestId('profile-drawing').evaluate((fig) => {
    const boxes = [...fig.querySelectorAll('svg text')].map((t) => ({ text: t.textContent ?? '', r: t.getBoundingClientRect() }));
    const hits: string[] = [];
    for (let i = 0; i < boxes.length; i++)
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i]!.r, b = boxes[j]!.r;
        if (a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom) hits.push(`${boxes[i]!.text} / ${boxes[j]!.text}`);
      }
    return { count: boxes.length, hits };
  });
  expect(overlaps.count).toBeGreaterThan(8);
  expect(overlaps.hits).toEqual([]);
  await screens(page, 'equipment-profile-operator');
  const id = page.url().match(/equipment\/(\d+)/)![1];
  const current = await (await page.request.get(`/api/equipment/${id}`)).json();
  const res = await page.request.put(`/api/equipment/${id}`, { data: { name: current.name, spec: current.spec, baseVersion: current.version } });
  expect(res.status()).toBe(403);
  expect((await page.goto('/equipment/new'))?.status()).toBe(403);
  await expect(page.getByText('403 · Not available for your role')).toBeVisible();
});

test('rigging inventory: filters, import with row errors (nothing imported), then a good import', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await page.goto('/rigging');
  const table = page.getByRole('table', { name: 'Rigging inventory' });
  const count = page.getByTestId('rigging-count');
  await expect(count).toHaveText('15 items');
  await screens(page, 'rigging-list');

  await page.getByLabel('Inspection due').selectOption('overdue');
  await expect(count).toHaveText('1 item');
  await expect(table.getByRole('link')).toHaveText(['HR-RS-05']);
  await expect(table.getByText(/^Overdue (?!\d{4}-\d{2}-\d{2}).*\d{4}$/)).toBeVisible();
  await page.getByLabel('Inspection due').selectOption('');
  await page.getByLabel('Status').selectOption('tagged_out');
  await expect(table.getByRole('link')).toHaveText(['HR-CH-02']);
  await page.getByLabel('Status').selectOption('');
  await page.getByLabel('Kind').selectOption('shackle');
  await expect(table.getByRole('link')).toHaveText(['HR-SH-01', 'HR-SH-02', 'HR-SH-03']);
  await page.getByLabel('Kind').selectOption('');
  await expect(count).toHaveText('15 items');

  const header = 'tag,kind,size,length_m,vertical_kg,choker_kg,basket_kg,status,last_inspection,next_inspection_due,notes';
  await page.getByLabel('Or paste the CSV').fill([header, 'HR-RS-30,round-sling,tan,3,,,,,,,', 'HR-XX-30,rope,,,,,,,,,', 'HR-SH-30,shackle,5/8,,,,,,2026-13-01,,'].join('\n'));
  await page.getByRole('button', { name: 'Import' }).click();
  await expect(page.getByText('Nothing was imported').first()).toBeVisible();
  const problems = page.getByRole('table', { name: 'Import problems' });
  await expect(problems.locator('tbody tr')).toHaveCount(2);
  await expect(problems.locator('tbody tr').first()).toContainText('3');
  await expect(problems.locator('tbody tr').first()).toContainText('kind');
  await expect(problems.locator('tbody tr').nth(1)).toContainText('last_inspection');
  await expect(count).toHaveText('15 items');
  await screens(page, 'rigging-import-errors');

  await page.getByLabel('Or paste the CSV').fill([header, 'HR-RS-30,round-sling,tan,3,,,,,,,', 'HR-SH-30,shackle,5/8,,,,,,,,'].join('\n'));
  await page.getByRole('button', { name: 'Import' }).click();
  await expect(page.getByText('Imported 2 items.')).toBeVisible();
  await expect(count).toHaveText('17 items');

  // The new shackle's rating came from the size table: 5/8 in → 3.25 t = 6 500 lb (value from memory).
  await table.getByRole('link', { name: 'HR-SH-30' }).click();
  await expect(page.getByTestId('table-ratings')).toContainText('6,500 lb');
  await screens(page, 'rigging-item');
  await page.goto('/rigging/new');
  await page.getByLabel('Colour (WSTDA code)').selectOption('blue');
  await expect(page.getByTestId('table-ratings')).toContainText('Vertical 21,200 lb');
  await expect(page.getByTestId('table-ratings')).toContainText('basket 42,400 lb');
  await screens(page, 'rigging-new');
});
