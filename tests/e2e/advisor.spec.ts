import { expect, test } from '@playwright/test';
import { HARROW_SCENES, sceneIdByTitle, screens, signIn } from './helpers';

/**
 * The placement search from the Placement tab (issue 17): on a copy of the demo coil transfer (so the
 * seeded scene other journeys read stays as seeded), run the search, apply the best proposal, and the
 * plan's figures change: the truck moves to the proposal and the worst case is the engine's for it.
 */
test('Placement tab: search the demo coil transfer, apply a proposal, the figures change and a new revision is saved', async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, 'operator@harrow.example');
  // The copy's title leaves out "coil": other journeys find the seeded scene by searching for it.
  const source = await sceneIdByTitle(page, HARROW_SCENES.coil);
  const copy = await page.request.post(`/api/scenes/${source}/duplicate`, { data: { title: 'Placement search journey (weigh-station lift, copied)' } });
  expect(copy.status()).toBe(201);
  const id = ((await copy.json()) as { id: number }).id;
  const revision = async () => ((await (await page.request.get(`/api/scenes/${id}`)).json()) as { revision: number }).revision;
  const rev0 = await revision();

  await page.goto(`/scenes/${id}`);
  await page.getByTestId('tab-results').click();
  await expect(page.getByTestId('results-summary')).toBeVisible();
  const before = { worst: await page.getByTestId('worst-case').textContent(), summary: await page.getByTestId('results-summary').textContent() };
  const truckAt = () => page.evaluate(() => {
    const t = window.__arclineEditor!.store.getState().document.objects.find((o) => o.kind === 'truck')!;
    return { x: t.x, y: t.y, rotation: t.rotation };
  });
  const pose0 = await truckAt();

  await page.getByTestId('tab-advisor').click();
  await expect(page.getByTestId('advisor-panel')).toBeVisible();
  // The demo truck stands on open ground: no standing warning.
  await expect(page.getByTestId('advisor-standing-warning')).toHaveCount(0);
  await page.getByTestId('advisor-start').click();
  await expect(page.getByTestId('advisor-results')).toBeVisible({ timeout: 120_000 });
  const proposals = page.getByTestId('advisor-proposal');
  await expect(proposals.first()).toBeVisible();
  expect(await proposals.count()).toBeGreaterThanOrEqual(2);
  await screens(page, 'placement-results', ['laptop', 'tablet-portrait']);

  // The first proposal that is not the plan as drawn has an Apply button; it is ranked above the drawn one.
  const apply = page.getByTestId('advisor-apply').first();
  await apply.click();
  await expect(page.getByTestId('advisor-results')).toHaveCount(0);

  const pose1 = await truckAt();
  expect(Math.hypot(pose1.x - pose0.x, pose1.y - pose0.y) + Math.abs(pose1.rotation - pose0.rotation)).toBeGreaterThan(0.01);
  await page.getByTestId('tab-results').click();
  await expect(page.getByTestId('results-summary')).toBeVisible();
  await expect.poll(async () => page.getByTestId('results-summary').textContent()).not.toBe(before.summary);
  expect(await page.getByTestId('worst-case').textContent()).not.toBe(before.worst);
  await screens(page, 'placement-applied', ['laptop', 'tablet-portrait']);
  // Applied as an edit, saved as a new revision.
  await expect.poll(revision, { timeout: 30_000 }).toBeGreaterThan(rev0);
});

test('Placement tab warns when the truck as drawn overlaps something on the ground (demo reefer scene: the guardrail)', async ({ page }) => {
  await signIn(page, 'operator@harrow.example');
  await page.goto(`/scenes/${await sceneIdByTitle(page, HARROW_SCENES.reefer)}`);
  await page.getByTestId('tab-advisor').click();
  const warning = page.getByTestId('advisor-standing-warning');
  await expect(warning).toBeVisible();
  await expect(warning).toContainText('the body overlaps Guardrail');
  await screens(page, 'placement-standing-warning', ['laptop']);
  // On a portrait tablet the panel is a drawer over the plan: the warning is there too.
  await page.setViewportSize({ width: 820, height: 1180 });
  await page.getByRole('button', { name: 'Details & results' }).click();
  await page.getByTestId('tab-advisor').click();
  await expect(page.getByTestId('advisor-standing-warning')).toBeVisible();
  await page.screenshot({ path: 'test-results/screens/placement-standing-warning-tablet-portrait.png' });
});
