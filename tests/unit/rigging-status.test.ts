import { formatDate } from '@/lib/format/date';
import { describe, expect, it } from 'vitest';
import { addVerdict, firstRating, isOverdue, pickNotices, type InventoryStatus } from '@/canvas/panels/inspector/rigging-status';

const TODAY = '2026-12-02';
const item = (over: Partial<InventoryStatus> = {}): InventoryStatus => ({ id: 4, tag: 'HR-RS-09', status: 'in_service', nextInspectionDue: '2027-03-01', ratings: { vertical: 2404, choker: 1923, basket: 4808 }, ...over });

describe('isOverdue', () => {
  it('is overdue only after the due day, and never without a due date', () => {
    expect(isOverdue({ nextInspectionDue: '2026-12-01' }, TODAY)).toBe(true);
    expect(isOverdue({ nextInspectionDue: TODAY }, TODAY)).toBe(false);
    expect(isOverdue({ nextInspectionDue: '2026-12-03' }, TODAY)).toBe(false);
    expect(isOverdue({ nextInspectionDue: null }, TODAY)).toBe(false);
  });
});

describe('pickNotices (rows already in the plan)', () => {
  it('says nothing about an in-service item that is inspected on time', () => {
    expect(pickNotices({ itemId: 4 }, item(), TODAY)).toEqual([]);
  });
  it('names the date an overdue inspection fell due', () => {
    expect(pickNotices({ itemId: 4 }, item({ nextInspectionDue: '2026-11-12' }), TODAY)).toEqual([{ tone: 'warn', text: `Inspection overdue since ${formatDate('2026-11-12')}` }]);
  });
  it('tells the planner to remove an item tagged out or retired since it was picked', () => {
    expect(pickNotices({ itemId: 4 }, item({ status: 'tagged_out' }), TODAY)).toEqual([{ tone: 'stop', text: 'Tagged out: remove it from the plan' }]);
    expect(pickNotices({ itemId: 4 }, item({ status: 'retired', nextInspectionDue: '2026-01-05' }), TODAY)).toEqual([
      { tone: 'stop', text: 'Retired: remove it from the plan' },
      { tone: 'warn', text: `Inspection overdue since ${formatDate('2026-01-05')}` },
    ]);
  });
  it('flags an item that is no longer in the inventory, and leaves hand-entered rigging alone', () => {
    expect(pickNotices({ itemId: 4 }, undefined, TODAY)[0].tone).toBe('stop');
    expect(pickNotices({ itemId: null }, undefined, TODAY)).toEqual([]);
  });
});

describe('addVerdict (adding from the inventory)', () => {
  it('adds an in-service item without a warning', () => {
    expect(addVerdict(item(), TODAY)).toEqual({ ok: true, warning: null });
  });
  it('adds an overdue item but says so', () => {
    expect(addVerdict(item({ nextInspectionDue: '2026-11-12' }), TODAY)).toEqual({
      ok: true,
      warning: `HR-RS-09 added, but its inspection has been overdue since ${formatDate('2026-11-12')}: have it inspected before the lift.`,
    });
  });
  it('refuses a tagged-out or retired item with the reason', () => {
    expect(addVerdict(item({ status: 'tagged_out' }), TODAY)).toEqual({ ok: false, reason: 'HR-RS-09 is tagged out and cannot be added to a plan.' });
    expect(addVerdict(item({ status: 'retired' }), TODAY)).toEqual({ ok: false, reason: 'HR-RS-09 is retired and cannot be added to a plan.' });
  });
  it('refuses an item with no rating, and takes the vertical rating first', () => {
    expect(addVerdict(item({ ratings: { vertical: null, choker: null, basket: null } }), TODAY).ok).toBe(false);
    expect(firstRating(item())).toBe(2404);
    expect(firstRating(item({ ratings: { vertical: null, choker: 1923, basket: 4808 } }))).toBe(4808);
  });
});
