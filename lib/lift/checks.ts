import type { ReactionMaximum } from './bearing';
import type { Clearance } from './clearance';
import type { BoomClearance } from './boom-clearance';
import type { ChartLookup } from './load-chart';
import { padName, sideOf, type TruckSide } from './names';
import type { PowerLineClearance, PowerLineRule } from './power-lines';
import type { PreparedLift } from './prepare';
import type { RiggingFacts, RiggingVerdict } from './rigging';

/**
 * Every verdict of an analysis as data: what was checked (a stable code and the subject, by id and by
 * name), the figure and the plan's limit in SI, their ratio and a status. There is no sentence here: the
 * one formatter (lib/format/checks.ts) writes the words, in the viewer's units, for every surface.
 */
export type QuantityKind = 'force' | 'pressure' | 'length' | 'angle' | 'percent' | 'mass';
export type CheckStatus = 'within' | 'near' | 'beyond';
export type CheckCode = 'stability' | 'bearing' | 'clearance' | 'power-line' | 'rigging' | 'load-chart';
export type SubjectKind = 'tipping-line' | 'pad' | 'truck-part' | 'obstacle' | 'power-line' | 'sling' | 'shackle' | 'hook' | 'snatch-block' | 'winch' | 'load-chart';

/** SI units of each quantity kind inside the engine. */
export const SI_UNIT: Record<QuantityKind, string> = { force: 'kN', pressure: 'kPa', length: 'm', angle: '°', percent: '%', mass: 'kg' };

export interface CheckSubject {
  kind: SubjectKind;
  /** Input ids (pad codes, obstacle ids, rigging tags); a tipping line has its two pads' ids. */
  ids: string[];
  /** Names for people, one per id ("left rear", "shed"). */
  names: string[];
  /** Tipping lines only: the line's short code ("RL-RR") and the side of the truck it lies on. */
  line?: { code: string; side: TruckSide };
}

interface CheckBase {
  /** Unique within a result and stable between runs: "bearing:FL", "clearance:cab", "stability:upper-weight". */
  id: string;
  code: CheckCode;
  subject: CheckSubject;
  quantity: QuantityKind;
  /** The computed figure in SI (see SI_UNIT); null when there is none (no chart rating). */
  value: number | null;
  /** The plan's limit in SI; null when it must be set by someone else (a utility). */
  limit: number | null;
  /** value ÷ limit; null when either is missing. */
  ratio: number | null;
  /** 'at-most': the value must not exceed the limit; 'at-least': it must not fall below it. */
  sense: 'at-most' | 'at-least';
  status: CheckStatus;
  /** status !== 'beyond'. */
  ok: boolean;
  /** Slew of the figure, degrees (null where the check does not depend on the slew). */
  slew: number | null;
  /** Set for the checks repeated at the upper end of the load's weight uncertainty. */
  upperWeight: { percent: number; loadMass: number } | null;
}

export type Check =
  | (CheckBase & { code: 'stability'; facts: { tippingLoad: number | null } })
  | (CheckBase & { code: 'bearing'; facts: { force: number; underCribbing: boolean; liftsOff: boolean } })
  | (CheckBase & { code: 'clearance'; facts: Omit<Clearance, 'target' | 'name' | 'kind' | 'slew'> & { part: 'load' } })
  | (CheckBase & { code: 'clearance'; facts: Omit<BoomClearance, 'target' | 'name' | 'kind' | 'slew' | 'distance'> & { part: 'boom' } })
  | (CheckBase & { code: 'power-line'; facts: { nearest: PowerLineClearance['nearest']; rule: PowerLineRule } })
  | (CheckBase & { code: 'rigging'; facts: RiggingFacts & { element: RiggingVerdict['element'] } })
  | (CheckBase & { code: 'load-chart'; facts: Omit<ChartLookup, 'rated'> & { rated: number | null; radius: number; boomLength: number } });

/**
 * Within 10 % of a limit counts as near it (common practice, no published source): the figure is
 * within the plan's limit but there is little left.
 */
export const NEAR_FRACTION = 0.9;

export function statusOf(value: number | null, limit: number | null, sense: CheckBase['sense']): CheckStatus {
  if (value === null || limit === null) return 'beyond';
  if (sense === 'at-most') return value > limit ? 'beyond' : value >= NEAR_FRACTION * limit ? 'near' : 'within';
  return value < limit ? 'beyond' : value * NEAR_FRACTION <= limit ? 'near' : 'within';
}

type Figures = Pick<CheckBase, 'value' | 'limit' | 'sense'> & { status?: CheckStatus };
function figures(f: Figures): Pick<CheckBase, 'value' | 'limit' | 'ratio' | 'sense' | 'status' | 'ok'> {
  const status = f.status ?? statusOf(f.value, f.limit, f.sense);
  const ratio = f.value !== null && f.limit !== null && f.limit !== 0 ? f.value / f.limit : null;
  return { value: f.value, limit: f.limit, ratio, sense: f.sense, status, ok: status !== 'beyond' };
}

export type UpperWeight = CheckBase['upperWeight'];
const suffix = (uw: UpperWeight) => (uw ? ':upper-weight' : '');

function supportName(p: PreparedLift, id: string): string {
  const s = p.input.supports.find((x) => x.id === id);
  return s?.name ?? padName(id, s?.x ?? 0, s?.y ?? 0);
}

/** A tipping line as a subject: its two pads by id and name, its code and the side it lies on. */
export function lineSubject(p: PreparedLift, lineId: string): CheckSubject {
  const l = p.lines.find((x) => x.id === lineId);
  if (!l) return { kind: 'tipping-line', ids: [], names: [], line: { code: lineId, side: 'front' } };
  return { kind: 'tipping-line', ids: [l.from, l.to], names: [supportName(p, l.from), supportName(p, l.to)], line: { code: l.id, side: sideOf(l.nx, l.ny) } };
}

export function padSubject(p: PreparedLift, id: string): CheckSubject {
  return { kind: 'pad', ids: [id], names: [supportName(p, id)] };
}

export function stabilityCheck(p: PreparedLift, worst: { slew: number; percentOfTipping: number; line: string; tippingLoad: number | null }, limit: number, uw: UpperWeight = null): Check {
  return {
    id: `stability${suffix(uw)}`, code: 'stability', subject: lineSubject(p, worst.line), quantity: 'percent',
    ...figures({ value: worst.percentOfTipping, limit, sense: 'at-most' }),
    slew: worst.slew, upperWeight: uw, facts: { tippingLoad: worst.tippingLoad },
  };
}

export function bearingCheck(p: PreparedLift, m: ReactionMaximum, allowable: number, underCribbing: boolean, uw: UpperWeight = null): Check {
  return {
    id: `bearing:${m.support}${suffix(uw)}`, code: 'bearing', subject: padSubject(p, m.support), quantity: 'pressure',
    ...figures({ value: m.pressure, limit: allowable, sense: 'at-most' }),
    slew: m.slew, upperWeight: uw, facts: { force: m.force, underCribbing, liftsOff: m.liftsOff },
  };
}

/**
 * The load clears a part when it passes far enough beside it or far enough above it. The figure is the
 * one that decides: the vertical gap where the load passes over it, else the plan gap, unless only the
 * vertical gap meets the limit.
 */
export function clearanceCheck(c: Clearance, limit: number): Check {
  const beside = c.horizontal >= limit;
  const above = c.vertical >= limit;
  const value = c.overlapsInPlan || (!beside && above) ? c.vertical : c.horizontal;
  const status = !(beside || above) ? 'beyond' : statusOf(Math.max(c.horizontal, c.vertical), limit, 'at-least');
  return {
    id: `clearance:${c.target}`, code: 'clearance',
    subject: { kind: c.kind === 'body' ? 'truck-part' : 'obstacle', ids: [c.target], names: [c.name] }, quantity: 'length',
    ...figures({ value, limit, sense: 'at-least', status }),
    slew: c.slew, upperWeight: null,
    facts: { horizontal: c.horizontal, vertical: c.vertical, overlapsInPlan: c.overlapsInPlan, conflict: c.conflict, part: 'load' },
  };
}

/** The boom clears a part when its surface stays the plan's clearance limit away from it, in 3D. */
export function boomClearanceCheck(c: BoomClearance, limit: number): Check {
  return {
    id: `clearance:${c.target}:boom`, code: 'clearance',
    subject: { kind: c.kind === 'body' ? 'truck-part' : 'obstacle', ids: [c.target], names: [c.name] }, quantity: 'length',
    ...figures({ value: c.distance, limit, sense: 'at-least', ...(c.strikes ? { status: 'beyond' as const } : {}) }),
    slew: c.slew, upperWeight: null,
    facts: { alongBoom: c.alongBoom, height: c.height, strikes: c.strikes, part: 'boom' },
  };
}

export function powerLineCheck(pl: PowerLineClearance): Check {
  return {
    id: `power-line:${pl.id}`, code: 'power-line', subject: { kind: 'power-line', ids: [pl.id], names: [pl.name] }, quantity: 'length',
    ...figures({ value: pl.distance, limit: pl.required, sense: 'at-least' }),
    slew: pl.slew, upperWeight: null, facts: { nearest: pl.nearest, rule: pl.rule },
  };
}

export function riggingCheck(r: RiggingVerdict, uw: UpperWeight = null): Check {
  return {
    id: `rigging:${r.element}:${r.id}${suffix(uw)}`, code: 'rigging', subject: { kind: r.element, ids: [r.id], names: [r.name] }, quantity: 'mass',
    // Not lifting rigging has no limit at all, so the check fails (status beyond).
    ...figures({ value: r.demand, limit: r.facts.refused ? null : r.capacity, sense: 'at-most' }),
    slew: null, upperWeight: uw, facts: { ...r.facts, element: r.element },
  };
}

export function loadChartCheck(look: ChartLookup & { percent: number | null }, radius: number, boomLength: number, limit: number, uw: UpperWeight = null): Check {
  return {
    id: `load-chart${suffix(uw)}`, code: 'load-chart', subject: { kind: 'load-chart', ids: [], names: [] }, quantity: 'percent',
    ...figures({ value: look.percent, limit, sense: 'at-most' }),
    slew: null, upperWeight: uw,
    facts: { rated: look.rated, radiusUsed: look.radiusUsed, boomLengthUsed: look.boomLengthUsed, missing: look.missing, radius, boomLength },
  };
}
