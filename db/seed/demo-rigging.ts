import type { Kysely } from 'kysely';
import type { Database } from '../schema';
import { createRiggingItem, recordInspection } from '../repositories/rigging';
import { riggingItemSchema, type RiggingItemInput } from '@/lib/validations/rigging';
import { resolveRatings, type ResolvedRiggingItem } from '@/lib/equipment/rigging-item';
import { TIE_DOWN_SOURCE_ID } from '@/lib/lift/ratings';
import { addDays, today as todayIso } from '@/lib/dates';
import { KG_PER_LB } from '@/lib/units';

/**
 * Invented demo rigging inventory. Tags and items are made up for the demo; ratings come from the
 * built-in tables (values from memory, see lib/equipment/rigging-ratings.ts) or are invented examples.
 * Dates are relative to the day the seed runs, so one item is always overdue.
 * Items marked `carriedOver` stand for rows entered before the lifting rules (a recovery strap with a
 * rating, grade 70 chain rated from the tie-down table): the API would refuse them today, so the seed
 * writes them as they were and the inventory shows them flagged with the reason.
 */
type DemoItem = Omit<RiggingItemInput, 'lastInspection' | 'nextInspectionDue'> & { inspectedDaysAgo: number | null; dueInDays: number | null; carriedOver?: string };

const HARROW: DemoItem[] = [
  { tag: 'HR-RS-01', kind: 'round-sling', size: 'purple', length: 3.05, inspectedDaysAgo: 40, dueInDays: 325 },
  { tag: 'HR-RS-02', kind: 'round-sling', size: 'green', length: 3.05, inspectedDaysAgo: 40, dueInDays: 325 },
  { tag: 'HR-RS-03', kind: 'round-sling', size: 'yellow', length: 4.57, inspectedDaysAgo: 40, dueInDays: 325 },
  { tag: 'HR-RS-04', kind: 'round-sling', size: 'red', length: 6.1, inspectedDaysAgo: 40, dueInDays: 12 },
  { tag: 'HR-RS-05', kind: 'round-sling', size: 'blue', length: 6.1, inspectedDaysAgo: 385, dueInDays: -20, notes: 'Annual inspection overdue (demo).' },
  { tag: 'HR-RS-06', kind: 'round-sling', size: 'blue', length: 6.1, inspectedDaysAgo: 40, dueInDays: 325 },
  { tag: 'HR-SH-01', kind: 'shackle', size: '5/8', inspectedDaysAgo: 60, dueInDays: 305 },
  { tag: 'HR-SH-02', kind: 'shackle', size: '3/4', inspectedDaysAgo: 60, dueInDays: 305 },
  { tag: 'HR-SH-03', kind: 'shackle', size: '1', inspectedDaysAgo: 60, dueInDays: 305 },
  { tag: 'HR-CH-01', kind: 'chain', size: '3/8 in grade 80', length: 6.1, inspectedDaysAgo: 30, dueInDays: 335 },
  { tag: 'HR-CH-02', kind: 'chain', size: '1/2 in grade 100', length: 6.1, status: 'tagged_out', inspectedDaysAgo: 5, dueInDays: null, notes: 'Tagged out: stretched link found (demo).' },
  { tag: 'HR-SB-01', kind: 'snatch-block', size: '12 t block (example)', ratings: { vertical: 10886, choker: null, basket: null }, inspectedDaysAgo: 90, dueInDays: 275 },
  { tag: 'HR-HK-01', kind: 'hook', size: '7 t eye hook (example)', ratings: { vertical: 6350, choker: null, basket: null }, inspectedDaysAgo: 60, dueInDays: 305 },
  { tag: 'HR-ST-01', kind: 'recovery-strap', size: '100 mm × 9 m (example)', length: 9.1, ratings: { vertical: 9072, choker: null, basket: null }, inspectedDaysAgo: 20, dueInDays: 345, carriedOver: 'entered' },
  { tag: 'HR-WS-01', kind: 'web-sling', size: '2-ply 75 mm (example)', length: 3.05, ratings: { vertical: 2812, choker: 2245, basket: 5624 }, inspectedDaysAgo: 20, dueInDays: 345 },
];

const COBALT: DemoItem[] = [
  { tag: 'CF-RS-01', kind: 'round-sling', size: 'white', length: 4.57, inspectedDaysAgo: 50, dueInDays: 315 },
  { tag: 'CF-SH-01', kind: 'shackle', size: '7/8', inspectedDaysAgo: 50, dueInDays: 315 },
  { tag: 'CF-CH-01', kind: 'chain', size: '3/8 in grade 70', length: 4.9, ratings: { vertical: 6600 * KG_PER_LB, choker: null, basket: null }, inspectedDaysAgo: 50, dueInDays: 315, carriedOver: TIE_DOWN_SOURCE_ID },
  { tag: 'CF-CH-02', kind: 'chain', size: '9/32 in grade 100', length: 3.05, inspectedDaysAgo: 50, dueInDays: 315 },
];

export const DEMO_RIGGING = { 'harrow-ridge': HARROW, 'cobalt-flats': COBALT } as const;

export async function seedDemoRigging(trx: Kysely<Database>, orgIds: Map<string, number>, userIds: Map<string, number>) {
  const today = todayIso();
  const inspectors = { 'harrow-ridge': userIds.get('operator@harrow.example')!, 'cobalt-flats': userIds.get('operator@cobalt.example')! };
  for (const [org, items] of Object.entries(DEMO_RIGGING) as [keyof typeof DEMO_RIGGING, DemoItem[]][]) {
    const orgId = orgIds.get(org)!;
    for (const { inspectedDaysAgo, dueInDays, carriedOver, ...d } of items) {
      const data = riggingItemSchema.parse({ ...d, lastInspection: null, nextInspectionDue: null });
      let resolved: ReturnType<typeof resolveRatings> | { ok: true; item: ResolvedRiggingItem } = resolveRatings(data);
      if (carriedOver) resolved = { ok: true, item: { ...data, ratingSource: carriedOver } };
      if (!resolved.ok) throw new Error(`Demo rigging ${d.tag}: ${resolved.issues[0].message}`);
      const item = await createRiggingItem(trx, orgId, resolved.item);
      if (inspectedDaysAgo !== null) {
        await recordInspection(trx, orgId, item.id, inspectors[org], {
          inspectedOn: addDays(today, -inspectedDaysAgo),
          result: d.status === 'tagged_out' ? 'fail' : 'pass',
          nextDue: dueInDays === null ? null : addDays(today, dueInDays),
          notes: d.status === 'tagged_out' ? 'Stretched link; tagged out (demo).' : 'Visual and tactile check (demo).',
        });
      }
    }
  }
}
