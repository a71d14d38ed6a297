import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, sceneIdByTitle, signIn } from './helpers';

test.describe.configure({ timeout: 180_000 });

const WIDTHS = [
  { width: 1366, height: 900 },
  { width: 820, height: 1180 },
  { width: 390, height: 844 },
];

/** Pixels the page is wider than its viewport (0 when nothing overflows sideways). */
const overflow = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);

test('the Users page and its "Add a user" card fit the screen at 1366, 820 and 390 px', async ({ page }) => {
  await signIn(page, 'admin@harrow.example');
  for (const size of WIDTHS) {
    await page.setViewportSize(size);
    await page.goto('/admin/users');
    await expect(page.getByRole('button', { name: /Deactivate/ }).first()).toBeVisible();
    expect(await overflow(page), `Users at ${size.width} px`).toBeLessThanOrEqual(0);
    const card = page.getByRole('heading', { name: 'Add a user' });
    const box = (await card.boundingBox())!;
    expect(box.x + box.width, `"Add a user" at ${size.width} px`).toBeLessThanOrEqual(size.width);
  }
});

test('the scene list and details page show the plan figures with the caution, and fit every width', async ({ page }) => {
  await signIn(page, 'supervisor@harrow.example');
  await page.goto(`/scenes?q=${encodeURIComponent('Coil transfer')}`);
  const table = page.getByRole('table', { name: 'Scenes' });
  await expect(table.getByRole('columnheader', { name: 'Tipping' })).toBeVisible();
  const row = table.getByRole('row').filter({ hasText: HARROW_SCENES.coil });
  await expect(row).toContainText(/\d+ %/);
  await expect(page.getByTestId('caution-note')).toBeVisible();
  for (const size of WIDTHS) {
    await page.setViewportSize(size);
    await page.reload();
    await expect(table.getByText(HARROW_SCENES.coil)).toBeVisible();
    expect(await overflow(page), `Scenes at ${size.width} px`).toBeLessThanOrEqual(0);
  }

  await page.setViewportSize(WIDTHS[0]);
  await page.getByRole('link', { name: `Details of ${HARROW_SCENES.coil}` }).click();
  await expect(page.getByTestId('plan-thumbnail')).toBeVisible();
  await expect(page.getByTestId('plan-figures')).toContainText('Worst % of tipping');
  await expect(page.getByTestId('plan-figures')).toContainText('of allowable');
  await expect(page.getByText('You can read this scene.')).toHaveCount(0);
  await expect(page.getByTestId('caution-note')).toBeVisible();
  for (const size of WIDTHS) {
    await page.setViewportSize(size);
    await page.reload();
    await expect(page.getByTestId('plan-thumbnail')).toBeVisible();
    expect(await overflow(page), `Details at ${size.width} px`).toBeLessThanOrEqual(0);
  }
});

test('a trainer adds a scene to the training set from the list, and the filter finds it', async ({ page }) => {
  await signIn(page, 'trainer@harrow.example');
  await page.goto(`/scenes?q=${encodeURIComponent('reefer')}`);
  await page.getByLabel(`Actions for ${HARROW_SCENES.reefer}`).click();
  const toggle = page.getByRole('button', { name: /training set/ });
  const wasIn = (await toggle.getAttribute('aria-pressed')) === 'true';
  const id = await sceneIdByTitle(page, HARROW_SCENES.reefer);
  try {
    await toggle.click();
    // Wait for the change to be saved before leaving the page, or the navigation can cancel it. (The list
    // refreshes after the change and its row menu may close, so the saved scene is read, not the button.)
    await expect.poll(async () => ((await (await page.request.get(`/api/scenes/${id}`)).json()) as { inTrainingSet: boolean }).inTrainingSet).toBe(!wasIn);
    // The filter, narrowed by the title too: other journeys add scenes that could push this one off page 1.
    await page.goto(`/scenes?training=${wasIn ? '0' : '1'}&q=reefer`);
    await expect(page.getByRole('table', { name: 'Scenes' }).getByText(HARROW_SCENES.reefer)).toBeVisible();
    await expect(page.getByLabel('Training set')).toHaveValue(wasIn ? '0' : '1');
  } finally {
    // Put the training set back as the seed has it, pass or fail: the replay and lesson journeys build lessons from this scene.
    expect((await page.request.put(`/api/scenes/${id}/training`, { data: { inTrainingSet: wasIn } })).status()).toBe(200);
  }
});

test('selects show a chevron', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  const image = await page.getByLabel('Status').evaluate((el) => getComputedStyle(el).backgroundImage);
  expect(image).toContain('data:image/svg+xml');
});

test('leaving the settings with an unsaved choice asks first', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await page.goto('/settings');
  await page.getByRole('radio', { name: /Metres and kilograms/ }).check();
  let asked = '';
  page.once('dialog', (d) => {
    asked = d.message();
    void d.dismiss();
  });
  await page.getByRole('link', { name: 'Scenes' }).filter({ visible: true }).first().click();
  await expect(page).toHaveURL(/\/settings$/);
  expect(asked).toContain('not saved');
  page.once('dialog', (d) => void d.accept());
  await page.getByRole('link', { name: 'Scenes' }).filter({ visible: true }).first().click();
  await expect(page).toHaveURL(/\/scenes$/);
});
