import { expect, test, type Page } from '@playwright/test';
import { createSceneViaApi, signIn } from './helpers';

test.describe.configure({ timeout: 180_000 });

/**
 * Every form with unsaved changes asks before an in-app link takes the user away: dismissing keeps them on
 * the page with what they typed; accepting leaves. (The settings form has its own test in field-pages.)
 */
async function expectGuarded(page: Page, typed: { label: string | RegExp; value: string }) {
  const here = page.url();
  let asked = '';
  page.once('dialog', (d) => {
    asked = d.message();
    void d.dismiss();
  });
  await page.getByRole('link', { name: 'Scenes', exact: true }).filter({ visible: true }).first().click();
  await expect.poll(() => asked).toContain('not saved');
  expect(page.url()).toBe(here);
  await expect(page.getByLabel(typed.label, { exact: typeof typed.label === 'string' }).first()).toHaveValue(typed.value);
}

async function fill(page: Page, label: string, value: string) {
  await page.getByLabel(label, { exact: true }).first().fill(value);
  return { label, value };
}

test('truck profile, rigging item, inspection and users forms ask before leaving with unsaved changes', async ({ page }) => {
  await signIn(page, 'admin@harrow.example');

  await page.goto('/equipment/new');
  await expectGuarded(page, await fill(page, 'Name', 'Unsaved rotator profile'));

  await page.goto('/rigging/new');
  await expectGuarded(page, await fill(page, 'Tag', 'HR-UNSAVED-1'));

  const items = (await (await page.request.get('/api/rigging')).json()) as { items: { id: number; tag: string }[] };
  await page.goto(`/rigging/${items.items.find((i) => i.tag === 'HR-RS-01')!.id}`);
  await expectGuarded(page, await fill(page, 'Notes', 'Cover scuffed near the eye'));

  await page.goto('/admin/users');
  await expectGuarded(page, await fill(page, 'Name', 'Half-typed Person'));

  // Accepting leaves, and a form left untouched lets the user go without asking.
  page.once('dialog', (d) => void d.accept());
  await page.getByRole('link', { name: 'Scenes', exact: true }).filter({ visible: true }).first().click();
  await expect(page).toHaveURL(/\/scenes$/);
  await page.goto('/rigging/new');
  let asked = false;
  page.once('dialog', (d) => {
    asked = true;
    void d.dismiss();
  });
  await page.getByRole('link', { name: 'Scenes', exact: true }).filter({ visible: true }).first().click();
  await expect(page).toHaveURL(/\/scenes$/);
  expect(asked).toBe(false);
});

test('new scene, plan details and lesson forms ask before leaving with unsaved changes; a reload asks too', async ({ page, browser }) => {
  await signIn(page, 'operator@harrow.example');
  await page.goto('/scenes/new');
  await expectGuarded(page, await fill(page, 'Title', 'Half-typed scene title'));

  const id = await createSceneViaApi(page, `Leave guard: plan details ${Date.now()}`);
  await page.goto(`/scenes/${id}/plan`);
  const customer = await fill(page, 'Customer', 'Harrow County roads');
  await expectGuarded(page, customer);
  // The browser's own prompt on reload.
  let kind = '';
  page.once('dialog', (d) => {
    kind = d.type();
    void d.dismiss();
  });
  await page.reload({ timeout: 5_000 }).catch(() => undefined);
  await expect.poll(() => kind).toBe('beforeunload');
  await expect(page.getByLabel('Customer', { exact: true })).toHaveValue(customer.value);

  const trainer = await (await browser.newContext()).newPage();
  await signIn(trainer, 'trainer@harrow.example');
  await trainer.goto('/lessons');
  await expectGuarded(trainer, await fill(trainer, 'Lesson title', 'Half-typed lesson'));
});
