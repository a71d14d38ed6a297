import type { TruckObject } from '@/lib/scene/objects';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import { bodyClear, groundOf, padClear } from './ground';
import type { Proposal } from './types';

/**
 * Where the truck as drawn stands, by the advisor's own ground rules (ground.ts): `clear`, `outside` the
 * usable ground marked on the plan, or `blocked` by an obstacle, trailer or the load on the ground. Null
 * when there is no truck. `parts` names the body or the pads that do not stand; `blockers`, the objects in
 * their way (their label, else their kind).
 */
export interface Standing {
  status: 'clear' | 'outside' | 'blocked';
  parts: string[];
  blockers: string[];
}

export function truckStanding(doc: SceneDocument, model: TruckModel): Standing | null {
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  if (!truck) return null;
  const inUseIds = Object.keys(truck.legs);
  const inUse = model.legs.filter((l) => inUseIds.length === 0 || inUseIds.includes(l.id));
  const { x, y, rotation: heading } = truck;
  const failing = (g: ReturnType<typeof groundOf>) => {
    const parts: string[] = [];
    if (!bodyClear(g, model, x, y, heading, inUse)) parts.push('body');
    for (const l of inUse) if (!padClear(g, l, truck.legs[l.id]?.extension ?? 0, x, y, heading)) parts.push(l.id);
    return parts;
  };
  const area = doc.usableArea ?? null;
  if (area) {
    const outside = failing({ ...groundOf(doc, area), blockers: [] });
    if (outside.length) return { status: 'outside', parts: outside, blockers: [] };
  }
  const blocked = failing(groundOf(doc, null));
  if (!blocked.length) return { status: 'clear', parts: [], blockers: [] };
  const blockers = doc.objects
    .filter((o) => o.kind !== 'truck' && failing(groundOf({ ...doc, objects: [o] }, null)).length > 0)
    .map((o) => o.label || (o.kind === 'obstacle' ? o.obstacleKind.replace('-', ' ') : o.kind));
  return { status: 'blocked', parts: blocked, blockers };
}

/**
 * True when no proposal beats the plan as drawn: every proposal other than the drawn placement has a
 * lower least margin than it (or there is none). False when the drawn plan has no finite margin.
 */
export function noneBetter(proposals: readonly Proposal[], start: { leastMargin: Proposal['leastMargin'] } | null): boolean {
  if (!start || !Number.isFinite(start.leastMargin.margin)) return false;
  return proposals.filter((p) => !p.current).every((p) => !(p.leastMargin.margin >= start.leastMargin.margin));
}
