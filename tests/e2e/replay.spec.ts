import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, screens, signIn } from './helpers';

/** The trainer's replay room: play, the worst case against the engine, compare, a lesson, and a what-if. */

async function sceneId(page: Page, title: string): Promise<number> {
  const list = await (await page.request.get('/api/scenes?pageSize=50')).json();
  return list.items.find((s: { title: string }) => s.title === title).id;
}
const slewShown = async (page: Page) => Number((await page.getByTestId('replay-slew').textContent())!.replace('°', ''));

test('a trainer plays a replay, jumps to the worst case, compares revisions, presents a lesson and tries a what-if', async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, 'trainer@harrow.example');
  const id = await sceneId(page, HARROW_SCENES.reefer);

  // Play: the slew shown moves along the planned swing (200° → 160° clockwise).
  await page.goto(`/scenes/${id}/replay`);
  await expect(page.getByTestId('replay-percent')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('caution-note')).toBeVisible();
  const start = await slewShown(page);
  expect(start).toBe(200);
  await page.getByTestId('play-pause').click();
  await expect.poll(() => slewShown(page), { timeout: 10_000 }).toBeLessThan(198);
  await page.getByTestId('play-pause').click();

  // W: the slew and % shown are the engine's worst case, as /api/analyze answers for this scene's input.
  await expect(page.getByTestId('replay-worst')).toBeVisible();
  await page.keyboard.press('w');
  const input = await page.evaluate(() => {
    const lift = window.__arclineReplay!.store.getState().analysis!.lift;
    return lift.ok ? lift.input : null;
  });
  const analyzed = await (await page.request.post('/api/analyze', { data: input })).json();
  await expect(page.getByTestId('replay-slew')).toHaveText(`${analyzed.worstCase.slew.toFixed(1)}°`);
  await expect(page.getByTestId('replay-percent')).toHaveText(`${analyzed.worstCase.percentOfTipping.toFixed(1)} %`);
  // ...and the server's own figures for the saved revision agree.
  const saved = await (await page.request.get(`/api/scenes/${id}/revisions/3`)).json();
  expect(saved.analysis.worstCase.percentOfTipping).toBeCloseTo(analyzed.worstCase.percentOfTipping, 9);
  await screens(page, 'replay', ['laptop', 'tablet-portrait', 'tablet-landscape']);

  // Compare revision 1 (outriggers short) with revision 3: ghost plus a before/after table.
  await page.getByTestId('revision-timeline').getByRole('link', { name: 'Compare with 3' }).last().click();
  await expect(page).toHaveURL(/revision=3&compare=1/);
  const table = page.getByTestId('compare-table');
  await expect(table).toContainText('Revision 1 (faint on the plan) → revision 3');
  await expect(table.getByRole('row', { name: /Highest pad pressure/ })).toContainText('psf');

  // A two-step lesson, presented step by step.
  await page.goto('/lessons');
  const form = page.getByTestId('lesson-form');
  await form.getByLabel('Lesson title').fill('Replay e2e: reading the reefer plan');
  await form.getByLabel('Step 1 scene').selectOption({ label: HARROW_SCENES.reefer });
  await form.getByLabel('Step 1 revision').fill('1');
  await form.getByLabel('Step 1 notes').fill('Short right legs first.');
  await form.getByRole('button', { name: '+ Add a step' }).click();
  await form.getByLabel('Step 2 scene').selectOption({ label: HARROW_SCENES.reefer });
  await form.getByLabel('Step 2 question').fill('Which pad carries most?');
  await form.getByLabel('Step 2 answer').fill('RR');
  await form.getByRole('button', { name: 'Create lesson' }).click();
  await expect(page).toHaveURL(/\/lessons\/\d+$/);
  await expect(page.getByTestId('lesson-steps').getByRole('listitem')).toHaveCount(2);
  await page.setViewportSize({ width: 1920, height: 1080 });
  await page.getByRole('link', { name: 'Present' }).click();
  await expect(page.getByTestId('presenter')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('lesson-bar')).toContainText('step 1 of 2');
  await expect(page.getByTestId('lesson-bar')).toContainText('Short right legs first.');
  await expect(page.getByTestId('caution-note')).toBeVisible();
  // Figures readable from the back of a room: at least 28 px at 1920×1080.
  const size = await page.getByTestId('replay-percent').evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
  expect(size).toBeGreaterThanOrEqual(28);
  await page.keyboard.press(' ');
  await page.waitForTimeout(800);
  await page.screenshot({ path: 'test-results/screens/replay-presenter-1920.png' });
  await page.getByTestId('hide-results').check();
  await expect(page.getByTestId('replay-percent')).toHaveCount(0);
  await expect(page.getByTestId('results-hidden')).toBeVisible();
  await page.getByTestId('lesson-next').click();
  await expect(page.getByTestId('lesson-bar')).toContainText('step 2 of 2');
  await expect(page.getByTestId('lesson-bar')).toContainText('Which pad carries most?');
  await page.setViewportSize({ width: 1366, height: 900 });

  // What-if: a heavier load changes the figures; the saved scene does not change.
  const before = await (await page.request.get(`/api/scenes/${id}`)).json();
  await page.goto(`/scenes/${id}/replay`);
  await expect(page.getByTestId('replay-percent')).toBeVisible({ timeout: 30_000 });
  const pct0 = await page.getByTestId('replay-percent').textContent();
  await page.getByRole('button', { name: 'What-if' }).click();
  await expect(page.getByText('Sandbox: these changes are not saved to the scene.')).toBeVisible();
  await page.getByTestId('what-if-mass').fill('22000');
  await expect(page.getByTestId('replay-percent')).not.toHaveText(pct0!);
  const after = await (await page.request.get(`/api/scenes/${id}`)).json();
  expect(after.revision).toBe(before.revision);
  expect(after.document).toEqual(before.document);
  expect((await (await page.request.get(`/api/scenes/${id}/revisions`)).json()).length).toBe(3);
});
