import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { getDb } from '@/db';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { sceneIdByTitle } from '@/tests/setup/fixtures';
import { GET as pdfRoute } from '@/app/api/scenes/[id]/plan.pdf/route';
import { loadPlanData } from '@/app/api/scenes/[id]/load-plan';
import { startNewRevision } from '@/lib/server/review';
import { fetchPlanPdf } from './render-helpers';

/**
 * The plan document's sign-off comes from the review records (who approved, their role, when, the
 * conditions, the reason), and without a revision asked for the document is the approved revision.
 */
const REEFER = 'Overturned reefer trailer, Mill Creek on-ramp';
// The seed's approval conditions on the reefer plan (db/seed/demo-review.ts).
const CONDITIONS = 'Two more mats under the right rear pad. The second truck holds the tail before the pick.';
let reefer = 0;

beforeAll(async () => {
  await freshSeededDb();
  reefer = await sceneIdByTitle(REEFER);
}, 120_000);

describe('plan sign-off', { timeout: 120_000 }, () => {
  it('carries the approval record of the approved revision', async () => {
    const op = await demoUser('operator@harrow.example');
    const sup = await demoUser('supervisor@harrow.example');
    const d = await loadPlanData(getDb(), op, reefer, undefined);
    expect(d.meta.approved).toBe(true);
    expect(d.signOff).toHaveLength(1);
    const row = await getDb().selectFrom('scene_submissions').select(['decided_at', 'revision']).where('scene_id', '=', reefer).where('state', '=', 'approved').executeTakeFirstOrThrow();
    expect(d.signOff[0]).toEqual({ action: 'Approved', by: sup.name, role: 'supervisor', at: row.decided_at, conditions: CONDITIONS, reason: '' });
    expect(d.meta.revision).toBe(row.revision);
  });

  it('prints the approver, role and conditions in the PDF (pdftotext)', async () => {
    const sup = await demoUser('supervisor@harrow.example');
    signInAs(await demoUser('operator@harrow.example'));
    const pdf = await fetchPlanPdf(pdfRoute, String(reefer));
    expect(pdf.status).toBe(200);
    expect(pdf.prose).toContain(`Approved by ${sup.name} (supervisor)`);
    expect(pdf.prose).toContain(`Conditions: ${CONDITIONS}`);
    expect(pdf.prose).not.toContain('No review is recorded for this revision');
  });

  it('defaults to the approved revision after a new draft revision is started; the draft has no sign-off', async () => {
    const op = await demoUser('operator@harrow.example');
    const approvedRev = (await loadPlanData(getDb(), op, reefer, undefined)).meta.revision;
    const started = await startNewRevision(getDb(), op, reefer);
    expect(started.status).toBe(200);
    expect(started.body.revision).toBe(approvedRev + 1);
    const byDefault = await loadPlanData(getDb(), op, reefer, undefined);
    expect(byDefault.meta.revision).toBe(approvedRev);
    expect(byDefault.meta.approved).toBe(true);
    expect(byDefault.signOff[0].conditions).toBe(CONDITIONS);
    const latest = await loadPlanData(getDb(), op, reefer, approvedRev + 1);
    expect(latest.meta.approved).toBe(false);
    expect(latest.signOff).toEqual([]);
    signInAs(op);
    const pdf = await fetchPlanPdf(pdfRoute, String(reefer), `revision=${approvedRev + 1}`);
    expect(pdf.prose).toContain('No review is recorded for this revision');
    for (const page of pdf.pages) expect(page).toContain('DRAFT');
  });
});
