import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { expect, test, type Browser, type Page } from '@playwright/test';
import { simpleParser } from 'mailparser';
import { CAUTION_TEXT } from '@/lib/caution';
import { HARROW_SCENES, screens, signIn } from './helpers';

/**
 * The review desk end to end, with two people in two browser contexts: the operator submits; the supervisor
 * pins a comment at a point and returns the plan; the operator sees the pin, moves a pad out and resubmits;
 * the supervisor sees what changed and approves with a condition; the operator can no longer edit and starts
 * a new revision. The fake SMTP server (scripts/e2e-server.sh) has kept every message: to the right people,
 * with links that open the plan.
 */
const TITLE = 'Review desk journey: coil to the low-loader';
const MAIL_DIR = path.join(process.cwd(), 'data', 'e2e', 'mail');
const CONDITION = 'Two more mats under the right rear pad before the pick.';

async function person(browser: Browser, email: string): Promise<Page> {
  const page = await (await browser.newContext({ viewport: { width: 1366, height: 900 } })).newPage();
  await signIn(page, email);
  return page;
}

async function mailTo(subject: string) {
  const files = readdirSync(MAIL_DIR).filter((f) => f.endsWith('.eml'));
  const parsed = await Promise.all(files.map(async (f) => simpleParser(readFileSync(path.join(MAIL_DIR, f)))));
  return parsed.filter((m) => m.subject === subject);
}

/** Waits until exactly `count` messages with this subject have arrived, and returns them. */
async function expectMail(subject: string, count: number) {
  await expect.poll(async () => (await mailTo(subject).catch(() => [])).length, { timeout: 45_000 }).toBe(count);
  return mailTo(subject);
}

const recipients = (m: Awaited<ReturnType<typeof mailTo>>[number]) => (Array.isArray(m.to) ? m.to : [m.to]).flatMap((a) => a?.value.map((v) => v.address) ?? []);

test('operator and supervisor take a plan through review to approval and a new revision', async ({ browser }) => {
  test.setTimeout(300_000);
  const operator = await person(browser, 'operator@harrow.example');
  const supervisor = await person(browser, 'supervisor@harrow.example');

  // A plan of the operator's own, drawn like the demo coil transfer.
  const list = (await (await operator.request.get(`/api/scenes?q=${encodeURIComponent('Route 9')}`)).json()) as { items: { id: number; title: string }[] };
  const coil = (await (await operator.request.get(`/api/scenes/${list.items.find((s) => s.title === HARROW_SCENES.coil)!.id}`)).json()) as { document: unknown; equipmentProfileId: number };
  const created = await operator.request.post('/api/scenes', { data: { title: TITLE, document: coil.document, equipmentProfileId: coil.equipmentProfileId } });
  expect(created.status()).toBe(201);
  const id = ((await created.json()) as { id: number }).id;

  // 1. The operator submits from the editor.
  await operator.goto(`/scenes/${id}`);
  await expect(operator.getByTestId('review-strip')).toContainText('Draft');
  await operator.getByTestId('submit-plan').click();
  await expect(operator.getByTestId('review-strip')).toContainText('Awaiting review');
  await expect(operator.getByTestId('withdraw-plan')).toBeVisible();

  // 2. The supervisor finds it in the queue (oldest first, so it is last), pins a comment at a point and returns it.
  await supervisor.goto('/review');
  await expect(supervisor.getByTestId('nav-count-review').first()).toHaveText(/^\d+$/);
  const card = supervisor.getByTestId('queue-item').filter({ hasText: TITLE });
  await expect(card).toBeVisible();
  await expect(supervisor.getByTestId('queue-item').last()).toContainText(TITLE);
  await screens(supervisor, 'review-queue', ['laptop', 'tablet-portrait', 'phone']);
  await card.getByRole('link', { name: TITLE }).click();
  await expect(supervisor).toHaveURL(new RegExp(`/scenes/${id}/review$`));
  await expect(supervisor.getByTestId('caution-note')).toBeVisible();
  await supervisor.getByTestId('review-tab-comments').click();
  await supervisor.getByTestId('pin-comment').click();
  const target = (await supervisor.getByTestId('pin-target').boundingBox())!;
  await supervisor.mouse.click(target.x + target.width * 0.3, target.y + target.height * 0.3);
  await supervisor.getByTestId('comment-text').fill('Put a spotter here for the swing past the scale house.');
  await supervisor.getByTestId('post-comment').click();
  await expect(supervisor.getByTestId('comment-pin')).toHaveCount(1);
  await screens(supervisor, 'review-comments', ['laptop', 'tablet-portrait', 'phone']);
  const threads = (await (await supervisor.request.get(`/api/scenes/${id}/comments`)).json()) as { items: { anchor: { x: number; y: number } | null }[] };
  expect(threads.items[0].anchor).toEqual({ x: expect.any(Number), y: expect.any(Number) });
  await supervisor.getByTestId('review-tab-decision').click();
  await screens(supervisor, 'review-decision', ['laptop', 'tablet-portrait', 'phone']);
  await supervisor.getByTestId('return-note').fill('See the pinned comment.');
  await supervisor.getByTestId('return').click();
  await expect(supervisor.getByTestId('decision-record')).toContainText('Returned with changes');

  // 3. The operator sees the pin, moves the right rear pad out and resubmits.
  await operator.reload();
  await expect(operator.getByTestId('review-strip')).toContainText('Returned for changes');
  await expect(operator.getByTestId('comment-pin')).toHaveCount(1);
  await screens(operator, 'editor-pins', ['laptop', 'tablet-portrait']);
  // The pin may sit under the status strip at this zoom: a tap on it, wherever it is.
  await operator.getByTestId('comment-pin').dispatchEvent('click');
  await expect(operator.getByTestId('editor-comments')).toContainText('Put a spotter here');
  await operator.getByTestId('editor-comments').getByRole('button', { name: 'Close' }).click();
  const before = await operator.evaluate(() => {
    const s = window.__arclineEditor!.store.getState();
    const t = s.document.objects.find((o) => o.kind === 'truck')!;
    return { id: t.id, x: t.x, y: t.y };
  });
  await operator.evaluate((truckId) => window.__arclineEditor!.store.getState().set({ selection: [truckId] } as never), before.id);
  await operator.getByTestId('tab-inspector').click();
  // The demo coil plan has the right rear leg out 2.2 m (7' 2.6"): pull it in to 6' 0".
  await operator.getByTestId('ext-RR').fill(`6' 0"`);
  await operator.getByTestId('ext-RR').press('Enter');
  await expect(operator.getByTestId('submit-plan')).toBeEnabled({ timeout: 20_000 });
  await operator.getByTestId('submit-plan').click();
  await expect(operator.getByTestId('review-strip')).toContainText('Awaiting review');

  // 4. The supervisor sees what changed since the returned revision and approves with a condition.
  await supervisor.reload();
  await expect(supervisor.getByTestId('changes-panel')).toContainText('outriggers and cribbing');
  await expect(supervisor.getByTestId('figure-changes')).toContainText('Worst % of tipping');
  await screens(supervisor, 'review-changes', ['laptop', 'phone']);
  await supervisor.getByTestId('review-tab-decision').click();
  await supervisor.getByTestId('conditions').fill(CONDITION);
  await supervisor.getByTestId('approve').click();
  await expect(supervisor.getByTestId('decision-record')).toContainText(CONDITION);
  // The scene's details page leads to the review page too.
  await supervisor.goto(`/scenes/${id}/details`);
  await supervisor.getByRole('link', { name: 'Review page' }).click();
  await expect(supervisor).toHaveURL(new RegExp(`/scenes/${id}/review$`));
  await supervisor.getByTestId('review-tab-decision').click();
  await expect(supervisor.getByTestId('decision-record')).toContainText(CONDITION);

  // 5. The operator can no longer edit; a new revision is a draft again.
  await operator.reload();
  await expect(operator.getByTestId('review-strip')).toContainText('Approved');
  await expect(operator.getByText('Read-only: you can look and scrub the slew, not edit')).toBeVisible();
  const current = ((await (await operator.request.get(`/api/scenes/${id}`)).json()) as { revision: number }).revision;
  const frozen = await operator.request.put(`/api/scenes/${id}`, { data: { revision: current, title: 'Renamed while approved' } });
  expect(frozen.status()).toBe(409);
  await operator.getByTestId('new-revision').click();
  await expect(operator.getByTestId('review-strip')).toContainText('Draft');
  await expect(operator.getByTestId('submit-plan')).toBeVisible();
  await expect(operator.getByText('Read-only: you can look and scrub the slew, not edit')).toHaveCount(0);

  // 6. The mail: supervisors on each submission, the operator on the comment, the return and the approval.
  const submitted = await expectMail(`For review: ${TITLE}`, 2);
  for (const m of submitted) expect(recipients(m)).toEqual(['supervisor@harrow.example']);
  for (const [subject, count] of [[`Comment on ${TITLE}`, 1], [`Returned: ${TITLE}`, 1], [`Approved: ${TITLE}`, 1]] as const) {
    const got = await expectMail(subject, count);
    expect(recipients(got[0])).toEqual(['operator@harrow.example']);
  }
  const approved = (await mailTo(`Approved: ${TITLE}`))[0];
  expect(approved.text).toContain(CONDITION);
  expect(approved.text).toContain(CAUTION_TEXT);
  expect(approved.html).toContain('<a href=');
  const link = approved.text!.match(/https?:\/\/\S+\/scenes\/\d+\S*/)![0];
  expect(link).toContain(`/scenes/${id}`);
  await operator.goto(link);
  await expect(operator.getByTestId('scene-title').first()).toContainText(TITLE);
  const review = submitted[0].text!.match(/https?:\/\/\S+\/scenes\/\d+\/review/)![0];
  await supervisor.goto(review);
  await expect(supervisor.getByTestId('review-desk')).toBeVisible();
});
