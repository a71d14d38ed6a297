import { describe, expect, it } from 'vitest';
import { noneBetter, truckStanding, type Proposal } from '@/lib/advisor';
import type { TruckObject } from '@/lib/scene/objects';
import { demoSites } from '@/scripts/bench-advisor';

/**
 * The Placement tab's warnings (issue 17): where the truck as drawn stands by the search's own ground
 * rules, and whether any proposal beats the plan as drawn. Demo scenes from db/seed (invented).
 */
const sites = demoSites();
const byTitle = (t: string) => sites.find((s) => s.title.startsWith(t))!;

describe('truck standing (Placement tab warning)', () => {
  it('is clear where the demo truck stands on open ground', () => {
    const s = byTitle('Coil transfer');
    expect(truckStanding(s.document, s.model)).toEqual({ status: 'clear', parts: [], blockers: [] });
  });

  it('names what the truck as drawn overlaps: the reefer scene’s body stands on the guardrail', () => {
    const s = byTitle('Overturned reefer');
    const st = truckStanding(s.document, s.model)!;
    expect(st.status).toBe('blocked');
    expect(st.parts).toContain('body');
    expect(st.blockers).toEqual(['Guardrail']);
    // Without the guardrail it stands clear: the warning is about that object, not the rest of the site.
    const doc = { ...s.document, objects: s.document.objects.filter((o) => o.label !== 'Guardrail') };
    expect(truckStanding(doc, s.model)!.status).toBe('clear');
  });

  it('says outside when the usable ground is marked away from the truck, and names what leaves it', () => {
    const s = byTitle('Coil transfer');
    const truck = s.document.objects.find((o): o is TruckObject => o.kind === 'truck')!;
    // A square 60 m × 60 m well east of the truck: nothing of it is inside.
    const far = [{ x: truck.x + 40, y: truck.y - 30 }, { x: truck.x + 100, y: truck.y - 30 }, { x: truck.x + 100, y: truck.y + 30 }, { x: truck.x + 40, y: truck.y + 30 }];
    const st = truckStanding({ ...s.document, usableArea: far }, s.model)!;
    expect(st.status).toBe('outside');
    expect(st.parts[0]).toBe('body');
    expect(st.parts.length).toBe(1 + Object.keys(truck.legs).length);
    // A square round the whole truck and its legs: inside.
    const round = [{ x: truck.x - 30, y: truck.y - 30 }, { x: truck.x + 30, y: truck.y - 30 }, { x: truck.x + 30, y: truck.y + 30 }, { x: truck.x - 30, y: truck.y + 30 }];
    expect(truckStanding({ ...s.document, usableArea: round }, s.model)!.status).toBe('clear');
  });
});

describe('no proposal better than the plan as drawn', () => {
  const prop = (rank: number, margin: number, current = false) => ({ rank, current, leastMargin: { check: 'stability', margin } }) as unknown as Proposal;
  const start = { leastMargin: { check: 'stability', margin: 0.2 } };
  it('is true when every other proposal has less margin, or the drawn placement is the only one', () => {
    expect(noneBetter([prop(1, 0.2, true), prop(2, 0.1), prop(3, -0.3)], start)).toBe(true);
    expect(noneBetter([prop(1, 0.19), prop(2, 0.05)], start)).toBe(true);
    expect(noneBetter([prop(1, 0.2, true)], start)).toBe(true);
  });
  it('is false when one proposal matches or beats it, or the drawn plan has no margin to compare', () => {
    expect(noneBetter([prop(1, 0.25), prop(2, 0.1)], start)).toBe(false);
    expect(noneBetter([prop(1, 0.2)], start)).toBe(false);
    expect(noneBetter([prop(1, 0.1)], null)).toBe(false);
    expect(noneBetter([prop(1, 0.1)], { leastMargin: { check: 'stability', margin: -Infinity } })).toBe(false);
  });
});
