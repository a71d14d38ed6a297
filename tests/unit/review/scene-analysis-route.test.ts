import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as analysis from '@/app/api/scenes/[id]/analysis/route';
import * as scene from '@/app/api/scenes/[id]/route';
import { getDb } from '@/db';
import { findEquipmentProfile, findProfileVersion, updateEquipmentProfile } from '@/db/repositories/equipment';
import { HR7_SPEC } from '@/db/seed/demo-trucks';
import { analyzeLift } from '@/lib/lift';
import { ENGINE_VERSION } from '@/lib/lift/version';
import { parseSceneDocument } from '@/lib/scene/parse';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { TITLES, TRUCKS, sceneIdByTitle, truckIdByUnit } from '@/tests/setup/fixtures';
import { call } from '@/tests/setup/call';

/**
 * GET /api/scenes/{id}/analysis: the server computes a saved revision exactly as the editor does (the
 * editor's own path: parse, the pinned profile version's truck model, sceneToLiftInput, the engine).
 */

let coil: number;
type Json = Record<string, unknown> & { issues?: { path: string }[]; worstCase: { percentOfTipping: number; slew: number }; checks: unknown[]; revision: number };

/** The editor's path for a stored document, run here independently of the route. */
async function editorResult(raw: unknown, organisationId: number) {
  const parsed = parseSceneDocument(raw);
  if (!parsed.ok) throw new Error('unparseable');
  const t = parsed.document.objects.find((o) => o.kind === 'truck');
  if (!t || t.kind !== 'truck') throw new Error('no truck');
  const v = (await findProfileVersion(getDb(), organisationId, t.profileId, t.profileVersion))!;
  const lift = sceneToLiftInput(parsed.document, truckModelFromProfile({ id: v.profileId, version: v.version, name: v.name, unitNumber: v.unitNumber, spec: v.spec }));
  if (!lift.ok) throw new Error(lift.problem.message);
  return analyzeLift(lift.input);
}

const get = (id: number | string, query?: string) => call({ handler: analysis.GET, method: 'GET', id: String(id), query }) as Promise<{ status: number; json: Json; text: string }>;

beforeAll(async () => {
  await freshSeededDb();
  coil = await sceneIdByTitle(TITLES.ownDraft);
});

describe('GET /api/scenes/{id}/analysis', () => {
  it('answers the engine result of the latest revision, equal to the editor path, with revision, engine version and pin', async () => {
    const op = await demoUser('operator@harrow.example');
    signInAs(op);
    const res = await get(coil);
    expect(res.status).toBe(200);
    const row = await getDb().selectFrom('scenes').select(['document', 'revision']).where('id', '=', coil).executeTakeFirstOrThrow();
    const expected = await editorResult(row.document, op.organisationId);
    expect(res.json.revision).toBe(row.revision);
    expect(res.json.sceneId).toBe(coil);
    expect(res.json.engineVersion).toBe(ENGINE_VERSION);
    expect(res.json.truckProfile).toEqual({ id: await truckIdByUnit(TRUCKS.harrow), version: 1 });
    expect(res.json.worstCase).toEqual(expected.worstCase);
    expect(res.json.checks).toEqual(expected.checks);
    // A real lift: a hook load somewhere between nothing and the tipping load, over a real swing.
    expect(res.json.worstCase.percentOfTipping).toBeGreaterThan(5);
    expect(res.json.worstCase.percentOfTipping).toBeLessThan(100);
    expect(Array.isArray(res.json.caution)).toBe(true);
  });

  it('caches by revision: the second read is a hit, and an older revision keeps its own figures after a save', async () => {
    const op = await demoUser('operator@harrow.example');
    signInAs(op);
    const first = await get(coil, 'revision=1');
    const again = await analysis.GET(new Request(`http://arcline.test/api/x?revision=1`), { params: Promise.resolve({ id: String(coil) }) });
    expect(again.headers.get('x-analysis-cache')).toBe('hit');
    // Move the load 1.5 m further out along the boom's line: a longer radius, a larger share of tipping.
    const cur = await getDb().selectFrom('scenes').select(['document', 'revision']).where('id', '=', coil).executeTakeFirstOrThrow();
    const doc = structuredClone(cur.document) as { objects: { kind: string; x: number; y: number }[]; };
    const truck = (doc.objects as unknown as { kind: string; boom: { length: number } }[]).find((o) => o.kind === 'truck')!;
    truck.boom.length += 1.5;
    const saved = await call({ handler: scene.PUT, method: 'PUT', id: String(coil), body: { revision: cur.revision, document: doc } });
    expect(saved.status).toBe(200);
    const latest = await get(coil);
    expect(latest.json.revision).toBe(cur.revision + 1);
    expect(latest.json.worstCase.percentOfTipping).toBeGreaterThan(first.json.worstCase.percentOfTipping);
    const old = await get(coil, 'revision=1');
    expect(old.json.worstCase).toEqual(first.json.worstCase);
    expect(old.json.revision).toBe(1);
  });

  it('computes with the version the sketch pins, not the profile as edited since', async () => {
    const admin = await demoUser('admin@harrow.example');
    const hr7 = await truckIdByUnit(TRUCKS.harrow);
    const p = (await findEquipmentProfile(getDb(), admin.organisationId, hr7))!;
    // Heavier counterweight in the new version: a plan drawn on version 1 must not pick it up.
    const spec = structuredClone(HR7_SPEC);
    spec.upper.counterweight.mass *= 2;
    const out = await updateEquipmentProfile(getDb(), admin.organisationId, hr7, { kind: 'truck', name: p.name, unitNumber: p.unitNumber, spec, baseVersion: p.version }, admin.id);
    expect(out.kind).toBe('ok');
    const rev1 = await getDb().selectFrom('scene_revisions').select('document').where('scene_id', '=', coil).where('revision', '=', 1).executeTakeFirstOrThrow();
    const onV1 = await editorResult(rev1.document, admin.organisationId);
    // The same sketch drawn on the edited version would report other figures, so this test can tell them apart.
    const redrawn = structuredClone(rev1.document) as { objects: { kind: string; profileVersion?: number }[] };
    redrawn.objects.find((o) => o.kind === 'truck')!.profileVersion = p.version + 1;
    const onV2 = await editorResult(redrawn, admin.organisationId);
    expect(onV2.worstCase.percentOfTipping).not.toBeCloseTo(onV1.worstCase.percentOfTipping, 3);
    signInAs(await demoUser('supervisor@harrow.example'));
    const res = await get(coil, 'revision=1');
    expect(res.json.worstCase).toEqual(onV1.worstCase);
    expect(res.json.truckProfile).toEqual({ id: hr7, version: 1 });
  });

  it('answers 404 for another organisation, an unknown scene and a revision that does not exist; 400 names a bad revision', async () => {
    signInAs(await demoUser('operator@cobalt.example'));
    expect((await get(coil)).status).toBe(404);
    signInAs(await demoUser('operator@harrow.example'));
    expect((await get(987654)).status).toBe(404);
    const missing = await get(coil, 'revision=99');
    expect(missing.status).toBe(404);
    expect(missing.json.error).toMatch(/revision 99/);
    expect(missing.json.issues).toEqual([{ path: 'query.revision', message: 'No such revision' }]);
    for (const bad of ['revision=0', 'revision=abc', 'revision=1.5', 'other=1']) {
      const r = await get(coil, bad);
      expect(r.status, bad).toBe(400);
      expect(r.json.issues?.[0]?.path, bad).toMatch(/^query\.(revision|other)$/);
    }
  });

  it('answers 422 with a code for a sketch the engine cannot analyse yet', async () => {
    const op = await demoUser('operator@harrow.example');
    signInAs(op);
    const created = await call({ handler: (await import('@/app/api/scenes/route')).POST, method: 'POST', body: { title: 'Empty lot' } });
    expect(created.status).toBe(201);
    const res = await get(created.json.id as number);
    expect(res.status).toBe(422);
    expect(res.json.code).toBe('incomplete');
    expect(res.json.error).toMatch(/Place the truck/);
  });
});
