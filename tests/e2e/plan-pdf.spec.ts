import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { HARROW_SCENES, sceneIdByTitle, screens, signIn } from './helpers';

const coilId = (page: Page) => sceneIdByTitle(page, HARROW_SCENES.coil);

test('the operator downloads the lift plan PDF and the drawing from the editor, and edits the plan details', async ({ page }) => {
  // The server renders the PDF and the editor loads its canvas: generous on a machine shared with other builds.
  test.setTimeout(240_000);
  await signIn(page, 'operator@harrow.example');
  const id = await coilId(page);
  await page.goto(`/scenes/${id}`);
  // The editor's own analysis (the results sit behind a tab at this width): the PDF's figures must match it.
  await page.waitForFunction(() => !!window.__arclineEditor?.store.getState().analysis?.result, undefined, { timeout: 90_000 });

  const [pdf] = await Promise.all([page.waitForEvent('download'), page.getByTestId('editor-download-plan').click()]);
  expect(pdf.suggestedFilename()).toMatch(/^lift-plan-AL-\d+-rev\d+\.pdf$/);
  const file = await pdf.path();
  const bytes = readFileSync(file);
  expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
  const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).replace(/[ \t]+/g, ' ');
  // The same figures the editor's own analysis reports.
  const worst = await page.evaluate(() => window.__arclineEditor!.store.getState().analysis!.result!.worstCase);
  expect(text).toContain(`Worst case: ${worst.percentOfTipping.toFixed(1)} % at slew ${worst.slew.toFixed(0)}°`);
  expect(text).toContain(HARROW_SCENES.coil);
  expect(text).toMatch(/Page 1 of \d+/);
  expect(text).toContain('Status: DRAFT');

  const [svg] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'SVG' }).click()]);
  expect(svg.suggestedFilename()).toMatch(/drawing\.svg$/);
  expect(readFileSync(await svg.path(), 'utf8')).toContain('<svg xmlns="http://www.w3.org/2000/svg"');
  const [png] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'PNG' }).click()]);
  expect(readFileSync(await png.path()).subarray(1, 4).toString()).toBe('PNG');

  await page.getByRole('link', { name: 'Plan details' }).click();
  await expect(page).toHaveURL(new RegExp(`/scenes/${id}/plan$`));
  await expect(page.getByLabel('Lift director')).toHaveValue('Mitch Varga');
  await screens(page, 'plan-details');
  await page.getByLabel('Customer').fill('Larkspur Haulage (demo)');
  await page.getByRole('button', { name: 'Save plan details' }).click();
  await expect(page.getByText(/Saved as revision \d+/)).toBeVisible({ timeout: 30_000 });
  const saved = await (await page.request.get(`/api/scenes/${id}/details`)).json();
  expect(saved.details.job.customer).toBe('Larkspur Haulage (demo)');
  await expect(page.getByTestId('download-plan-pdf')).toHaveAttribute('href', `/api/scenes/${id}/plan.pdf`);
});
