import type { LiftResult } from '@/lib/lift/result';
import { padLabel, tippingLineLabel } from '@/lib/lift/names';

/**
 * The headline figures of a computed plan, kept with each submission so that a supervisor judges what the
 * server computed, and split into hard limits (approval refused) and the plan's own stricter limits
 * (approval needs a written reason). Pure: the engine's result and its input limits in, data out.
 */
export type BreachKind = 'tipping' | 'load-chart' | 'rigging' | 'power-line' | 'ground';

export interface LimitBreach {
  /** The engine check's id ("stability", "bearing:RL", "power-line:feeder", …). */
  id: string;
  kind: BreachKind;
  /** The object or part concerned, as the plan names it. */
  subject: string;
  /** SI: % for tipping, load chart and rigging, m for power lines, kPa for ground. null: off the load chart. */
  value: number | null;
  /** null: no published limit applies (a power line over 350 kV). */
  limit: number | null;
  unit: '%' | 'm' | 'kPa';
}

export interface PlanFigures {
  percentOfTipping: number;
  tippingLine: string;
  tippingSlew: number;
  /** The plan's own limit on percent of tipping. */
  tippingLimit: number;
  /** Highest pad pressure over the swing against the ground's allowable. */
  ground: { support: string; pressure: number; allowable: number; percent: number } | null;
  /** The smallest gap from the load to a truck part or obstacle (the larger of beside and above). */
  leastClearance: { target: string; name: string; distance: number; limit: number } | null;
  /** Nearest power line against its 29 CFR 1926.1408 Table A distance. */
  powerLine: { id: string; name: string; distance: number; required: number | null } | null;
  loadChartPercent: number | null;
  riggingPercent: number | null;
  /** Over 100 % of tipping, of the load chart or of a rigging item's WLL, inside Table A, a pad over the allowable. */
  hardLimits: LimitBreach[];
  /** Ids of the checks beyond the plan's own limits that are not hard limits (the checks are stored beside). */
  beyondPlan: string[];
}

/** What the plan calls an object; never its internal id, which means nothing to a reader. */
const name = (names: Record<string, string>, id: string) => names[id] ?? 'an unnamed object';

/** Every hard-limit breach of a result, the nominal case and the upper end of an estimated weight. */
export function hardLimitBreaches(result: LiftResult, allowable: number, names: Record<string, string>): LimitBreach[] {
  const out: LimitBreach[] = [];
  const cases = [{ suffix: '', worst: result.worstCase, maxima: result.reactions.maxima }];
  if (result.upperWeight) cases.push({ suffix: ':upper-weight', worst: result.upperWeight.worstCase, maxima: result.upperWeight.reactionMaxima });
  for (const c of cases) {
    if (c.worst.percentOfTipping > 100) out.push({ id: `stability${c.suffix}`, kind: 'tipping', subject: `tipping about ${tippingLineLabel(c.worst.line)}`, value: c.worst.percentOfTipping, limit: 100, unit: '%' });
    for (const m of c.maxima) {
      if (m.pressure > allowable) out.push({ id: `bearing:${m.support}${c.suffix}`, kind: 'ground', subject: padLabel(m.support), value: m.pressure, limit: allowable, unit: 'kPa' });
    }
  }
  const chart = result.loadChart;
  if (chart && (chart.rated === null || (chart.percent ?? 0) > 100)) out.push({ id: 'load-chart', kind: 'load-chart', subject: 'load chart', value: chart.percent, limit: 100, unit: '%' });
  for (const r of result.rigging) {
    const pct = (100 * r.demand) / r.capacity;
    if (pct > 100) out.push({ id: `rigging:${r.element}:${r.id}`, kind: 'rigging', subject: `${r.element} ${r.name || r.id}`, value: pct, limit: 100, unit: '%' });
  }
  for (const l of result.powerLines) {
    // No Table A distance (over 350 kV): only the utility or an engineer can set one, so it cannot be approved here.
    if (l.required === null || l.distance < l.required) out.push({ id: `power-line:${l.id}`, kind: 'power-line', subject: l.name || name(names, l.id), value: l.distance, limit: l.required, unit: 'm' });
  }
  return out;
}

export function planFigures(result: LiftResult, input: { soil: { allowable: number }; limits?: { percentOfTipping?: number; clearance?: number } }, names: Record<string, string>): PlanFigures {
  const allowable = input.soil.allowable;
  const top = [...result.reactions.maxima].sort((a, b) => b.pressure - a.pressure)[0];
  const gaps = result.clearances.map((c) => ({ c, d: c.overlapsInPlan ? c.vertical : Math.max(c.horizontal, c.vertical) }));
  const least = gaps.sort((a, b) => a.d - b.d)[0];
  const line = [...result.powerLines].sort((a, b) => a.distance - b.distance)[0];
  const rigging = result.rigging.map((r) => (100 * r.demand) / r.capacity);
  const hardLimits = hardLimitBreaches(result, allowable, names);
  const hard = new Set(hardLimits.map((b) => b.id));
  return {
    percentOfTipping: result.worstCase.percentOfTipping,
    tippingLine: result.worstCase.line,
    tippingSlew: result.worstCase.slew,
    tippingLimit: input.limits?.percentOfTipping ?? 85,
    ground: top ? { support: top.support, pressure: top.pressure, allowable, percent: (100 * top.pressure) / allowable } : null,
    leastClearance: least ? { target: least.c.target, name: least.c.name || name(names, least.c.target), distance: least.d, limit: input.limits?.clearance ?? 0.3 } : null,
    powerLine: line ? { id: line.id, name: line.name || name(names, line.id), distance: line.distance, required: line.required } : null,
    loadChartPercent: result.loadChart?.percent ?? null,
    riggingPercent: rigging.length ? Math.max(...rigging) : null,
    hardLimits,
    beyondPlan: result.checks.filter((c) => c.status === 'beyond' && !hard.has(c.id)).map((c) => c.id),
  };
}
