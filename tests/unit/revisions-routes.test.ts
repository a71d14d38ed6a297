import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as revisions from '@/app/api/scenes/[id]/revisions/route';
import * as revisionOne from '@/app/api/scenes/[id]/revisions/[revision]/route';
import * as analysis from '@/app/api/scenes/[id]/analysis/route';
import * as newRevision from '@/app/api/scenes/[id]/new-revision/route';
import { getDb } from '@/db';
import { updateScene } from '@/db/repositories/scenes';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { sceneIdByTitle } from '@/tests/setup/fixtures';

/** The revisions API: each revision's figures are the server's engine result for that revision. */
let coil = 0;
type Fig = { worstPercentOfTipping: number; worstSlew: number; governingLine: string; highestPadPressure: number; highestPadPressureSupport: string; highestPadPressureSupportName: string; leastClearance: number; leastClearanceTarget: string; leastClearanceTargetName: string };
type Summary = { revision: number; savedAt: string; author: string; status: string; figures: Fig | null };
const ctx = (p: Record<string, string>) => ({ params: Promise.resolve(p) });
const req = (path: string) => new Request(`http://arcline.test${path}`);
const list = async (id: number) => revisions.GET(req(`/api/scenes/${id}/revisions`), ctx({ id: String(id) }));
const one = async (id: number | string, rev: number | string) => revisionOne.GET(req(`/api/scenes/${id}/revisions/${rev}`), ctx({ id: String(id), revision: String(rev) }));

beforeAll(async () => {
  await freshSeededDb();
  coil = await sceneIdByTitle('Coil transfer, Route 9 weigh station');
  // Revision 2: the rear-right outrigger pulled in from 2.2 m to 1.0 m, which should raise the worst % of tipping.
  const op = await demoUser('operator@harrow.example');
  const row = await getDb().selectFrom('scenes').select('document').where('id', '=', coil).executeTakeFirstOrThrow();
  const doc = structuredClone(row.document) as { objects: { kind: string; legs?: Record<string, { extension: number }> }[] };
  const truck = doc.objects.find((o) => o.kind === 'truck')!;
  truck.legs!.RR.extension = 1.0;
  const out = await updateScene(getDb(), op, coil, { revision: 1, document: doc });
  expect(out.kind).toBe('ok');
});

describe('GET /api/scenes/{id}/revisions', () => {
  it('lists every save newest first, with author, status and the engine’s headline figures', async () => {
    signInAs(await demoUser('trainer@harrow.example'));
    const res = await list(coil);
    expect(res.status).toBe(200);
    const items = (await res.json()) as Summary[];
    expect(items.map((r) => [r.revision, r.author, r.status])).toEqual([
      [2, 'Dana Okafor', 'draft'],
      [1, 'Dana Okafor', 'superseded'],
    ]);
    for (const r of items) {
      const a = await (await analysis.GET(req(`/api/scenes/${coil}/analysis?revision=${r.revision}`), ctx({ id: String(coil) }))).json();
      expect(r.figures!.worstPercentOfTipping).toBe(a.worstCase.percentOfTipping);
      expect(r.figures!.worstSlew).toBe(a.worstCase.slew);
      expect(r.figures!.governingLine).toBe(a.worstCase.line);
      const pressures = (a.reactions.maxima as { pressure: number }[]).map((m) => m.pressure);
      expect(r.figures!.highestPadPressure).toBe(Math.max(...pressures));
      const gaps = (a.clearances as { overlapsInPlan: boolean; vertical: number; horizontal: number }[]).map((c) => (c.overlapsInPlan ? c.vertical : Math.max(c.horizontal, c.vertical)));
      expect(r.figures!.leastClearance).toBe(Math.min(...gaps));
      // Named as on the plan, never by id.
      const nearest = (a.clearances as { name: string }[])[gaps.indexOf(Math.min(...gaps))]!;
      expect(r.figures!.leastClearanceTargetName).toBe(nearest.name);
      expect(r.figures!.leastClearanceTargetName).not.toMatch(/^(obstacle|trailer|load)-[a-z0-9]+$/);
      expect(r.figures!.highestPadPressureSupportName).toBe(({ FL: 'left front', FR: 'right front', RL: 'left rear', RR: 'right rear', FJ: 'front jack' } as Record<string, string>)[r.figures!.highestPadPressureSupport]);
    }
    // Pulling one outrigger in shrinks the support polygon: the worst case gets worse.
    expect(items[0].figures!.worstPercentOfTipping).toBeGreaterThan(items[1].figures!.worstPercentOfTipping);
  });
  it('another organisation gets 404', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    expect((await list(coil)).status).toBe(404);
  });
  it('an earlier revision carries the review decision on it: the approved revision stays "approved" after a new revision', async () => {
    const reefer = await sceneIdByTitle('Overturned reefer trailer, Mill Creek on-ramp');
    signInAs(await demoUser('operator@harrow.example'));
    const before = (await (await list(reefer)).json()) as Summary[];
    const approved = before[0]!;
    expect(approved.status).toBe('approved');
    const started = await newRevision.POST(new Request(`http://arcline.test/api/scenes/${reefer}/new-revision`, { method: 'POST' }), ctx({ id: String(reefer) }));
    expect(started.status).toBe(200);
    const after = (await (await list(reefer)).json()) as Summary[];
    expect(after[0]).toMatchObject({ revision: approved.revision + 1, status: 'draft' });
    expect(after.find((r) => r.revision === approved.revision)!.status).toBe('approved');
    // Revisions no review ever saw are simply superseded.
    expect(after.filter((r) => r.revision < approved.revision).every((r) => r.status === 'superseded')).toBe(true);
  });
});

describe('GET /api/scenes/{id}/revisions/{revision}', () => {
  it('answers the stored document and the engine result for that revision', async () => {
    signInAs(await demoUser('supervisor@harrow.example'));
    const res = await one(coil, 1);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.revision).toBe(1);
    const stored = await getDb().selectFrom('scene_revisions').select('document').where('scene_id', '=', coil).where('revision', '=', 1).executeTakeFirstOrThrow();
    expect(body.document).toEqual(stored.document);
    const a = await (await analysis.GET(req(`/api/scenes/${coil}/analysis?revision=1`), ctx({ id: String(coil) }))).json();
    expect(body.analysis.worstCase).toEqual(a.worstCase);
    expect(body.analysis.checks).toEqual(a.checks);
    expect(body.analysis.revision).toBe(1);
    expect(body.document.objects.find((o: { kind: string }) => o.kind === 'truck').legs.RR.extension).toBe(2.2);
  });
  it('a revision never saved is 404 naming revision; a malformed one is 400', async () => {
    signInAs(await demoUser('trainer@harrow.example'));
    const missing = await one(coil, 7);
    expect(missing.status).toBe(404);
    expect((await missing.json()).issues).toEqual([{ path: 'params.revision', message: 'No such revision' }]);
    const bad = await one(coil, '1e1');
    expect(bad.status).toBe(400);
    expect((await bad.json()).issues[0].path).toBe('params.revision');
  });
});
