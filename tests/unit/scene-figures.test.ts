import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { call } from '@/tests/setup/call';
import * as scenes from '@/app/api/scenes/route';
import * as scene from '@/app/api/scenes/[id]/route';
import { getDb } from '@/db';
import { analyseSavedScene } from '@/lib/server/scene-analysis';
import { figureWritesSettled } from '@/lib/server/scene-figures';
import { planFigures } from '@/lib/scene/plan-figures';
import { headlineFigures } from '@/lib/replay/headline-figures';
import type { ListFigures } from '@/lib/scene/plan-figures';

const COIL = 'Coil transfer, Route 9 weigh station';
type Item = { id: number; title: string; revision: number; figures: ListFigures };

const list = async () => {
  const items = (await call({ handler: scenes.GET, method: 'GET', query: 'pageSize=100' })).json.items as Item[];
  // The list stores newly computed figures just after it answers.
  await figureWritesSettled();
  return items;
};
const rowsFor = (id: number) => getDb().selectFrom('scene_figures').selectAll().where('scene_id', '=', id).execute();

beforeAll(async () => {
  await freshSeededDb();
});

describe('the list’s plan figures', () => {
  it('are the server analysis of the latest revision, stored once per revision', async () => {
    const user = await demoUser('supervisor@harrow.example');
    signInAs(user);
    const coil = (await list()).find((s) => s.title === COIL)!;
    const found = await analyseSavedScene(getDb(), user, coil.id);
    if (found.kind !== 'done' || !found.analysis.ok) throw new Error('the demo coil transfer should compute');
    const r = found.analysis.result;
    const head = headlineFigures(r);
    expect(coil.figures.problem).toBeNull();
    expect(coil.figures.percentOfTipping).toBeCloseTo(r.worstCase.percentOfTipping, 9);
    expect(coil.figures.leastClearance).toBeCloseTo(head.leastClearance!, 9);
    // Ground pressure as % of allowable: the highest pad pressure over the soil's allowable.
    expect(coil.figures.percentOfBearing).toBeCloseTo((head.highestPadPressure! / found.analysis.input.soil.allowable) * 100, 6);
    expect(coil.figures).toMatchObject(planFigures(r));

    const stored = await rowsFor(coil.id);
    expect(stored).toHaveLength(1);
    expect(stored[0]!.revision).toBe(coil.revision);
    // A second read uses the stored row: nothing is recomputed or rewritten.
    await list();
    expect(await rowsFor(coil.id)).toEqual(stored);
  });

  it('a scene with nothing to compute says why, and a new revision replaces the stored row', async () => {
    const op = await demoUser('operator@harrow.example');
    signInAs(op);
    const created = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Figures: empty sketch at the yard' } });
    const id = created.json.id as number;
    const first = (await list()).find((s) => s.id === id)!;
    expect(first.figures.problem).toEqual(expect.any(String));
    expect(first.figures.percentOfTipping).toBeNull();
    expect((await rowsFor(id)).map((r) => r.revision)).toEqual([1]);
    expect((await call({ handler: scene.PUT, method: 'PUT', id: String(id), body: { revision: 1, title: 'Figures: renamed sketch' } })).status).toBe(200);
    await list();
    expect((await rowsFor(id)).map((r) => r.revision)).toEqual([2]);
  });

  it('two lists computing the same figures at once (two instances) both answer, and one row is kept', async () => {
    const op = await demoUser('operator@harrow.example');
    signInAs(op);
    const id = (await call({ handler: scenes.POST, method: 'POST', body: { title: 'Figures: two readers at once' } })).json.id as number;
    // Neither read finds a stored row, so both compute and both store: the second store replaces the first.
    const [a, b] = await Promise.all([call({ handler: scenes.GET, method: 'GET', query: 'pageSize=100' }), call({ handler: scenes.GET, method: 'GET', query: 'pageSize=100' })]);
    expect([a.status, b.status]).toEqual([200, 200]);
    await figureWritesSettled();
    expect((await rowsFor(id)).map((r) => r.revision)).toEqual([1]);
  });
});
