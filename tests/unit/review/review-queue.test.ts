import { beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { REVIEW_TITLES } from '@/db/seed/demo-review-scenes';
import { navCounts, reviewQueue } from '@/lib/server/review-queue';
import { filterQueue, queueFlags, waitedFor, type QueueItem } from '@/lib/review/queue';
import type { PlanFigures } from '@/lib/review/figures';
import { demoUser, freshSeededDb } from '@/tests/setup/db';

/** The supervisor's review queue: which plans, in which order, with which flags; and the counts in the navigation. */
const figures = (over: Partial<PlanFigures> = {}): PlanFigures => ({
  percentOfTipping: 60, tippingLine: 'front', tippingSlew: 90, tippingLimit: 85, ground: null, leastClearance: null, powerLine: null,
  loadChartPercent: null, riggingPercent: null, hardLimits: [], beyondPlan: [], ...over,
});
const ctx = { profileVersions: new Map([[7, 3]]), overdueItems: { ids: new Set([41]), tags: new Set(['RS-9']) } };
const doc = (truck: Record<string, unknown>, load: Record<string, unknown>) => ({ objects: [{ kind: 'truck', ...truck }, { kind: 'load', ...load }] });

describe('queueFlags', () => {
  it('flags nothing on a weighed load, a current truck profile and inspected rigging', () => {
    expect(queueFlags(doc({ profileId: 7, profileVersion: 3 }, { massMode: 'given', rigging: [{ itemId: 40, tag: 'RS-1' }] }), figures(), ctx)).toEqual([]);
  });
  it('flags each condition on its own', () => {
    const breach = { id: 'stability', kind: 'tipping' as const, subject: 'tipping line front', value: 104, limit: 100, unit: '%' as const };
    expect(queueFlags(doc({}, {}), figures({ hardLimits: [breach] }), ctx)).toEqual(['beyond-hard-limit']);
    expect(queueFlags(doc({}, {}), figures({ beyondPlan: ['clearance:cab'] }), ctx)).toEqual(['beyond-plan-limits']);
    expect(queueFlags(doc({}, { rigging: [{ itemId: 41, tag: 'X' }] }), figures(), ctx)).toEqual(['inspection-overdue']);
    // A pick copied without an inventory id is matched by its tag; one with an id only by its id.
    expect(queueFlags(doc({}, { rigging: [{ itemId: null, tag: 'RS-9' }] }), figures(), ctx)).toEqual(['inspection-overdue']);
    expect(queueFlags(doc({}, { rigging: [{ itemId: 40, tag: 'RS-9' }] }), figures(), ctx)).toEqual([]);
    expect(queueFlags(doc({ profileId: 7, profileVersion: 2 }, {}), figures(), ctx)).toEqual(['truck-changed']);
    expect(queueFlags(doc({}, { massMode: 'estimate' }), figures(), ctx)).toEqual(['estimated-load']);
    expect(queueFlags(doc({}, { massMode: 'given' }), figures(), { ...ctx, weightSource: 'estimated' })).toEqual(['estimated-load']);
    expect(queueFlags(doc({}, { massMode: 'given' }), figures(), { ...ctx, weightSource: 'weighed' })).toEqual([]);
  });
  it('reads a document with no objects without failing', () => {
    expect(queueFlags({}, figures(), ctx)).toEqual([]);
    expect(queueFlags(null, figures(), ctx)).toEqual([]);
  });
});

describe('waitedFor', () => {
  it('says minutes, hours and minutes, then days', () => {
    expect([waitedFor(0), waitedFor(59), waitedFor(60), waitedFor(190), waitedFor(60 * 24), waitedFor(60 * 24 * 3 + 5)]).toEqual(['0 min', '59 min', '1 h 0 min', '3 h 10 min', '1 day', '3 days']);
  });
});

describe('the seeded queue', () => {
  beforeAll(freshSeededDb);

  it('lists the organisation’s submitted plans oldest first, with the figures stored at submission', async () => {
    const items = await reviewQueue(getDb(), await demoUser('supervisor@harrow.example'));
    const titles = items.map((i) => i.title);
    // The seed submits the pipe bundle 180 min ago and the livestock trailer 40 min ago.
    expect(titles.indexOf(REVIEW_TITLES.awaiting)).toBeLessThan(titles.indexOf(REVIEW_TITLES.beyond));
    expect(titles).not.toContain(REVIEW_TITLES.returned);
    for (let i = 1; i < items.length; i++) expect(items[i - 1].submittedAt <= items[i].submittedAt).toBe(true);
    const awaiting = items.find((i) => i.title === REVIEW_TITLES.awaiting)!;
    expect(awaiting.waitingMinutes).toBeGreaterThanOrEqual(179);
    expect(awaiting.ownerName).toBeTruthy();
    expect(awaiting.truck).toMatch(/HR-7/);
    const stored = await getDb().selectFrom('scene_submissions').select('figures').where('scene_id', '=', awaiting.sceneId).where('state', '=', 'pending').executeTakeFirstOrThrow();
    expect(awaiting.figures.percentOfTipping).toBe((stored.figures as unknown as PlanFigures).percentOfTipping);
    const beyond = items.find((i) => i.title === REVIEW_TITLES.beyond)!;
    expect(beyond.flags).toContain('beyond-hard-limit');
    expect(awaiting.flags).not.toContain('beyond-hard-limit');
  });

  it('shows another organisation nothing of Harrow Ridge’s queue', async () => {
    const items = await reviewQueue(getDb(), await demoUser('operator@cobalt.example'));
    expect(items.some((i) => i.title === REVIEW_TITLES.awaiting || i.title === REVIEW_TITLES.beyond)).toBe(false);
  });

  it('counts the queue for reviewers only, and unread notifications for everyone', async () => {
    const sup = await navCounts(getDb(), await demoUser('supervisor@harrow.example'));
    expect(sup.review).toBe((await reviewQueue(getDb(), await demoUser('supervisor@harrow.example'))).length);
    expect(sup.review).toBeGreaterThanOrEqual(2);
    // The seed tells the supervisor of each of the two pending submissions, and operator2 of the returned plan.
    expect(sup.unread).toBe(2);
    const op = await navCounts(getDb(), await demoUser('operator2@harrow.example'));
    expect(op).toEqual({ review: null, unread: 1 });
  });

  it('filters by flag, operator and truck, keeping the order', async () => {
    const items = await reviewQueue(getDb(), await demoUser('supervisor@harrow.example'));
    const hard = filterQueue(items, { flag: 'beyond-hard-limit', operator: null, truck: null });
    expect(hard.map((i) => i.title)).toEqual(items.filter((i) => i.flags.includes('beyond-hard-limit')).map((i) => i.title));
    expect(hard.map((i) => i.title)).toContain(REVIEW_TITLES.beyond);
    expect(filterQueue(items, { flag: null, operator: 'Nobody Here', truck: null })).toEqual([]);
    const byOwner = filterQueue(items, { flag: null, operator: items[0].ownerName, truck: items[0].truck });
    expect(byOwner[0]).toEqual(items[0] as QueueItem);
  });
});
