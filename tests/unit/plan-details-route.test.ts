import { getDb } from '@/db';
import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { call } from '@/tests/setup/call';
import { GET, PUT } from '@/app/api/scenes/[id]/details/route';
import { sceneIdByTitle } from '@/tests/setup/fixtures';
import { DETAIL_LIMITS, STARTER_CHECKLIST, emptyPlanDetails } from '@/lib/plan-details/schema';

const COIL = 'Coil transfer, Route 9 weigh station';
let coil = '';

beforeAll(async () => {
  await freshSeededDb();
  coil = String(await sceneIdByTitle(COIL));
});

describe('plan details route', () => {
  it('reads the seeded details of revision 1 and saves new ones as a new revision', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const first = await call({ handler: GET, method: 'GET', id: coil });
    expect(first.status).toBe(200);
    expect(first.json.revision).toBe(1);
    expect((first.json.details as { people: { operator: string } }).people.operator).toBe('Dana Okafor');

    const details = { ...emptyPlanDetails(), job: { customer: 'Larkspur Haulage (demo)', reference: 'R-1', location: 'Pier 3', when: '2026-12-04T07:00' } };
    const saved = await call({ handler: PUT, method: 'PUT', id: coil, body: { revision: 1, details } });
    expect(saved.status).toBe(200);
    expect(saved.json.revision).toBe(2);
    // The job's location becomes the scene's searchable location.
    const scene = await getDb().selectFrom('scenes').select('location').where('id', '=', Number(coil)).executeTakeFirstOrThrow();
    expect(scene.location).toBe('Pier 3');

    // Revision 2 carries the new details; revision 1 still reads the details it was saved with.
    const now = await call({ handler: GET, method: 'GET', id: coil, query: 'revision=2' });
    expect((now.json.details as { job: { customer: string } }).job.customer).toBe('Larkspur Haulage (demo)');
    expect((now.json.details as { checklist: { item: string }[] }).checklist.map((c) => c.item)).toEqual([...STARTER_CHECKLIST]);
    const then = await call({ handler: GET, method: 'GET', id: coil, query: 'revision=1' });
    expect((then.json.details as { job: { customer: string } }).job.customer).toBe('Brindlewood Coil Carriers (demo)');

    // A save based on the old revision is refused.
    const stale = await call({ handler: PUT, method: 'PUT', id: coil, body: { revision: 1, details } });
    expect(stale.status).toBe(409);
    expect(stale.json.currentRevision).toBe(2);
  });

  it('answers 404 for a revision the scene does not have, and 400 for a malformed one', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const missing = await call({ handler: GET, method: 'GET', id: coil, query: 'revision=99' });
    expect(missing.status).toBe(404);
    expect(missing.json.issues?.[0].path).toBe('query.revision');
    const bad = await call({ handler: GET, method: 'GET', id: coil, query: 'revision=1e1' });
    expect(bad.status).toBe(400);
    expect(bad.json.issues?.[0].path).toBe('query.revision');
  });

  it('refuses text over its limit naming the field, and unknown fields', async () => {
    signInAs(await demoUser('operator@harrow.example'));
    const rev = (await call({ handler: GET, method: 'GET', id: coil })).json.revision as number;
    const tooLong = { ...emptyPlanDetails(), contingency: 'x'.repeat(DETAIL_LIMITS.long + 1) };
    const res = await call({ handler: PUT, method: 'PUT', id: coil, body: { revision: rev, details: tooLong } });
    expect(res.status).toBe(400);
    expect(res.json.issues?.[0].path).toBe('details.contingency');
    const hazards = { ...emptyPlanDetails(), hazards: Array.from({ length: DETAIL_LIMITS.hazards + 1 }, () => ({ hazard: 'h', control: 'c' })) };
    expect((await call({ handler: PUT, method: 'PUT', id: coil, body: { revision: rev, details: hazards } })).json.issues?.[0].path).toBe('details.hazards');
    const unknown = await call({ handler: PUT, method: 'PUT', id: coil, body: { revision: rev, details: { ...emptyPlanDetails(), people: { cook: 'x' } } } });
    expect(unknown.status).toBe(400);
    expect(unknown.json.issues?.[0].path).toBe('details.people.cook');
  });

  it('lets only the owner save; other organisations see 404', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    expect((await call({ handler: GET, method: 'GET', id: coil })).status).toBe(404);
    signInAs(await demoUser('supervisor@harrow.example'));
    expect((await call({ handler: GET, method: 'GET', id: coil })).status).toBe(200);
    expect((await call({ handler: PUT, method: 'PUT', id: coil, body: { revision: 1, details: emptyPlanDetails() } })).status).toBe(403);
  });

  it('refuses to save the details of a submitted or approved plan (409, nothing written); a returned plan goes back to draft', async () => {
    const db = getDb();
    const sceneOf = async (title: string) => db.selectFrom('scenes').select(['id', 'revision', 'status']).where('title', '=', title).executeTakeFirstOrThrow();
    const revisionsOf = async (id: number) => Number((await db.selectFrom('scene_revisions').select((eb) => eb.fn.countAll<number>().as('n')).where('scene_id', '=', id).executeTakeFirstOrThrow()).n);

    signInAs(await demoUser('operator@harrow.example'));
    const approved = await sceneOf('Overturned reefer trailer, Mill Creek on-ramp');
    expect(approved.status).toBe('approved');
    const before = await revisionsOf(approved.id);
    const refused = await call({ handler: PUT, method: 'PUT', id: String(approved.id), body: { revision: approved.revision, details: emptyPlanDetails() } });
    expect(refused.status).toBe(409);
    expect(refused.json.issues?.[0].path).toBe('status');
    expect(String(refused.json.error)).toContain('Start a new revision');
    expect(await sceneOf('Overturned reefer trailer, Mill Creek on-ramp')).toEqual(approved);
    expect(await revisionsOf(approved.id)).toBe(before);

    signInAs(await demoUser('operator2@harrow.example'));
    const submitted = await sceneOf('Pipe bundle onto the low-loader, Station Road yard');
    expect(submitted.status).toBe('submitted');
    const frozen = await call({ handler: PUT, method: 'PUT', id: String(submitted.id), body: { revision: submitted.revision, details: emptyPlanDetails() } });
    expect(frozen.status).toBe(409);
    expect(String(frozen.json.error)).toContain('Withdraw it');
    expect((await sceneOf('Pipe bundle onto the low-loader, Station Road yard')).revision).toBe(submitted.revision);

    const returned = await sceneOf('Tipped grain trailer, Kestrel Lane');
    expect(returned.status).toBe('returned');
    const saved = await call({ handler: PUT, method: 'PUT', id: String(returned.id), body: { revision: returned.revision, details: emptyPlanDetails() } });
    expect(saved.status).toBe(200);
    expect(saved.json.revision).toBe(returned.revision + 1);
    expect(await sceneOf('Tipped grain trailer, Kestrel Lane')).toEqual({ ...returned, revision: returned.revision + 1, status: 'draft' });
  });
});
