import { describe, expect, it } from 'vitest';
import { PLAN_EVENTS, PLAN_STATUSES, isEditable, transition, type PlanEvent, type PlanStatus } from '@/lib/review/lifecycle';

/**
 * Every (status, event) pair of the review lifecycle, legal or not (issue 13: draft → submitted →
 * approved or returned; returned → draft on edit; withdraw back to draft; a new revision of an approved plan
 * is a draft). The table lists the legal ones; every other pair must be refused with a message.
 */
const LEGAL: [PlanStatus, PlanEvent, PlanStatus][] = [
  ['draft', 'edit', 'draft'],
  ['draft', 'submit', 'submitted'],
  ['submitted', 'withdraw', 'draft'],
  ['submitted', 'approve', 'approved'],
  ['submitted', 'return', 'returned'],
  ['approved', 'new-revision', 'draft'],
  ['returned', 'edit', 'draft'],
  ['returned', 'submit', 'submitted'],
];

const key = (s: string, e: string) => `${s} + ${e}`;
const legal = new Map(LEGAL.map(([s, e, to]) => [key(s, e), to]));

describe('review lifecycle', () => {
  for (const status of PLAN_STATUSES) {
    for (const event of PLAN_EVENTS) {
      const want = legal.get(key(status, event));
      it(`${key(status, event)} → ${want ?? 'refused'}`, () => {
        const t = transition(status, event);
        if (want) expect(t).toEqual({ ok: true, to: want });
        else {
          expect(t.ok).toBe(false);
          expect(!t.ok && t.message.length).toBeGreaterThan(20);
        }
      });
    }
  }

  it('covers every pair: 5 statuses × 6 events, 8 of them legal', () => {
    const results = PLAN_STATUSES.flatMap((s) => PLAN_EVENTS.map((e) => transition(s, e).ok));
    expect(results).toHaveLength(30);
    expect(results.filter(Boolean)).toHaveLength(8);
  });

  it('tells the operator of a frozen plan what to do instead', () => {
    const approved = transition('approved', 'edit');
    expect(!approved.ok && approved.message).toMatch(/Start a new revision/);
    const submitted = transition('submitted', 'edit');
    expect(!submitted.ok && submitted.message).toMatch(/Withdraw/);
  });

  it('lets only drafts and returned plans be edited', () => {
    expect(PLAN_STATUSES.filter(isEditable)).toEqual(['draft', 'returned']);
  });
});
