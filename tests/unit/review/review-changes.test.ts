import { beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { REVIEW_TITLES } from '@/db/seed/demo-review-scenes';
import { figureChanges, sceneChanges } from '@/lib/review/changes';
import type { PlanFigures } from '@/lib/review/figures';
import { CURRENT_VERSION, sceneDocumentSchema, type SceneDocument } from '@/lib/scene/schema';
import { reviewPageData } from '@/lib/server/review-page';
import { decidePlan, submitPlan } from '@/lib/server/review';
import { updateScene } from '@/db/repositories/scenes';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { sceneIdByTitle } from '@/tests/setup/fixtures';

/** "What changed since the last review": the diff of two sketches, the figures side by side, and the page data. */
const doc = (objects: unknown[], extra: Record<string, unknown> = {}): SceneDocument => sceneDocumentSchema.parse({ version: CURRENT_VERSION, objects, ...extra });
const note = (id: string, x: number, y: number, text = 'n') => ({ kind: 'note', id, x, y, text });
const tree = (id: string, x: number, y: number, height = 6) => ({ kind: 'obstacle', id, x, y, obstacleKind: 'tree', shape: { kind: 'circle', diameter: 3 }, height });

describe('sceneChanges', () => {
  it('finds objects added, removed, moved (how far, how much turned) and changed', () => {
    const before = doc([note('a', 0, 0), tree('t', 10, 0), note('gone', 5, 5)]);
    const after = doc([note('a', 3, 4), { ...tree('t', 10, 0, 8), rotation: 0 }, note('new', 1, 1)]);
    const c = sceneChanges(before, after);
    const by = Object.fromEntries(c.objects.map((o) => [o.id, o]));
    // A 3-4-5 triangle: the note moved exactly 5 m.
    expect(by.a).toMatchObject({ change: 'moved', turned: 0, fields: [] });
    expect(by.a.moved).toBeCloseTo(5, 12);
    expect(by.t).toMatchObject({ change: 'changed', fields: ['height'] });
    expect(by.new.change).toBe('added');
    expect(by.gone.change).toBe('removed');
    expect(c.site).toEqual([]);
  });
  it('gives the turn the short way round, signed anticlockwise', () => {
    const c = sceneChanges(doc([{ ...note('a', 0, 0), rotation: 350 }]), doc([{ ...note('a', 0, 0), rotation: 10 }]));
    expect(c.objects[0].change).toBe('moved');
    expect(c.objects[0].turned).toBeCloseTo(20, 9);
  });
  it('ignores a move under a millimetre and names site-level changes', () => {
    const c = sceneChanges(doc([note('a', 0, 0)]), doc([note('a', 0.0004, 0)], { soil: { preset: 'custom', allowable: 200 } }));
    expect(c.objects).toEqual([]);
    expect(c.site).toEqual(['ground and its allowable pressure']);
  });
  it('reports nothing for the same sketch', () => {
    const d = doc([note('a', 1, 2), tree('t', 3, 4)]);
    expect(sceneChanges(d, d)).toEqual({ objects: [], site: [] });
  });
});

describe('figureChanges', () => {
  it('puts each stored headline figure before and after, leaving out figures neither has', () => {
    const f = (pct: number, gap: number): PlanFigures => ({
      percentOfTipping: pct, tippingLine: 'R', tippingSlew: 90, tippingLimit: 85, ground: { support: 'RR', pressure: 100, allowable: 144, percent: (100 * 100) / 144 },
      leastClearance: { target: 'cab', name: 'cab', distance: gap, limit: 0.3 }, powerLine: null, loadChartPercent: null, riggingPercent: null, hardLimits: [], beyondPlan: [],
    });
    const rows = figureChanges(f(72, 0.5), f(64, 0.9));
    expect(rows.map((r) => r.key)).toEqual(['tipping', 'ground', 'clearance']);
    expect(rows[0]).toMatchObject({ before: 72, after: 64, unit: '%', higherIsBetter: false });
    expect(rows[2]).toMatchObject({ before: 0.5, after: 0.9, unit: 'm', higherIsBetter: true });
  });
});

describe('review page data', () => {
  beforeAll(freshSeededDb);

  it('shows the pending revision with the figures stored at submission, and its pinned comment', async () => {
    const sup = await demoUser('supervisor@harrow.example');
    const id = await sceneIdByTitle(REVIEW_TITLES.awaiting);
    const d = (await reviewPageData(getDb(), sup, id))!;
    expect(d.submission?.state).toBe('pending');
    expect(d.revision).toBe(d.submission!.revision);
    expect(d.decisionRefusal).toBeNull();
    expect(d.threads[0].anchor).toEqual({ x: 11, y: -9.5 });
    expect(d.previous).toBeNull();
    // The plan's own operator may read it but not decide on it.
    const own = (await reviewPageData(getDb(), await demoUser('operator2@harrow.example'), id))!;
    expect(own.decisionRefusal).toMatch(/supervisor or admin/);
    expect(await reviewPageData(getDb(), await demoUser('operator@cobalt.example'), id)).toBeUndefined();
  });

  it('after a return, an edit and a resubmission, compares with the returned revision', async () => {
    const sup = await demoUser('supervisor@harrow.example');
    const op = await demoUser('operator2@harrow.example');
    const id = await sceneIdByTitle(REVIEW_TITLES.awaiting);
    const start = (await reviewPageData(getDb(), sup, id))!;
    expect((await decidePlan(getDb(), sup, id, { decision: 'return', revision: start.revision, note: 'Move the tree' })).status).toBe(200);
    const moved = { ...start.document, objects: start.document.objects.map((o) => (o.kind === 'load' ? { ...o, x: o.x + 0.6, y: o.y + 0.8 } : o)) };
    const saved = await updateScene(getDb(), op, id, { revision: start.revision, document: moved as unknown as Record<string, unknown>, status: 'draft' });
    expect(saved.kind).toBe('ok');
    const rev = saved.kind === 'ok' ? saved.revision : 0;
    expect((await submitPlan(getDb(), op, id, rev)).status).toBe(200);
    const d = (await reviewPageData(getDb(), sup, id))!;
    expect(d.revision).toBe(rev);
    expect(d.previous?.submission).toMatchObject({ revision: start.revision, state: 'returned', note: 'Move the tree' });
    const load = sceneChanges(d.previous!.document, d.document).objects.find((o) => o.kind === 'load')!;
    expect(load.change).toBe('moved');
    // 0.6 and 0.8 m: a 1 m move.
    expect(load.moved).toBeCloseTo(1, 9);
  });
});
