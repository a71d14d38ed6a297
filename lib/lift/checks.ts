import type { ReactionMaximum } from './bearing';
import type { Clearance } from './clearance';
import type { ChartLookup } from './load-chart';
import type { PowerLineClearance } from './power-lines';
import type { RiggingVerdict } from './rigging';

/**
 * Every verdict of an analysis, with a sentence a person can read. The wording reports margins against
 * the plan's limits ("within limit", "over limit"); it never calls a lift safe.
 */
export interface Check {
  id: string;
  ok: boolean;
  value: number | null;
  limit: number | null;
  unit: '%' | 'kPa' | 'm' | 'kg';
  reason: string;
}

/** Fixed decimals with thousands separators; toLocaleString is far slower and this runs per check. */
function f(n: number, d = 1): string {
  const [int, frac] = Math.abs(n).toFixed(d).split('.');
  const grouped = int.length > 3 ? int.replace(/\B(?=(\d{3})+(?!\d))/g, ',') : int;
  return (n < 0 && Number(n.toFixed(d)) !== 0 ? '−' : '') + grouped + (frac ? `.${frac}` : '');
}
const verdict = (ok: boolean) => (ok ? 'within limit' : 'over limit');

export function stabilityCheck(id: string, pct: number, slew: number, line: string, limit: number, label = ''): Check {
  const ok = pct <= limit;
  const margin = ok ? `margin ${f(limit - pct)} points` : `${f(pct - limit)} points over`;
  return {
    id, ok, value: pct, limit, unit: '%',
    reason: `${label}Worst case at slew ${f(slew)}°: the hook load is ${f(pct)} % of the tipping load about line ${line}; the plan's limit is ${f(limit, 0)} % (${verdict(ok)}, ${margin}).`,
  };
}

export function bearingCheck(m: ReactionMaximum, allowable: number, withCribbing: boolean, label = ''): Check {
  const ok = m.pressure <= allowable;
  const under = withCribbing ? 'the cribbing' : 'the pad';
  return {
    id: `bearing:${m.support}${label ? ':upper-weight' : ''}`, ok, value: m.pressure, limit: allowable, unit: 'kPa',
    reason: `${label}Support ${m.support} presses ${f(m.pressure, 0)} kPa on the ground under ${under} at slew ${f(m.slew)}° (${f(m.force)} kN); allowable ${f(allowable, 0)} kPa, ${verdict(ok)} (${f(Math.abs(100 - (100 * m.pressure) / allowable), 0)} % ${ok ? 'below' : 'above'}).`,
  };
}

export function clearanceCheck(c: Clearance, limit: number): Check {
  const beside = c.horizontal >= limit;
  const above = c.vertical >= limit;
  const ok = beside || above;
  const what = c.kind === 'body' ? 'truck part' : 'obstacle';
  let reason: string;
  if (!c.overlapsInPlan) {
    reason = `The load passes ${f(c.horizontal, 2)} m from ${what} ${c.target} in plan (nearest at slew ${f(c.slew)}°)` +
      (beside ? `; limit ${f(limit, 2)} m, within limit.` : above ? ` and ${f(c.vertical, 2)} m above its top; within limit.` : `, ${f(c.vertical, 2)} m above its top; limit ${f(limit, 2)} m, over limit.`);
  } else {
    reason = `The load passes over ${what} ${c.target} (from slew ${f(c.slew)}°) with its bottom ${f(c.vertical, 2)} m ${c.vertical >= 0 ? 'above' : 'below'} the top` +
      (above ? `; limit ${f(limit, 2)} m, within limit.` : c.conflict ? ': the load would strike it, over limit.' : `; limit ${f(limit, 2)} m, over limit.`);
  }
  return { id: `clearance:${c.target}`, ok, value: c.overlapsInPlan ? c.vertical : c.horizontal, limit, unit: 'm', reason };
}

export function powerLineCheck(pl: PowerLineClearance): Check {
  if (pl.required === null) {
    return {
      id: `power-line:${pl.id}`, ok: false, value: pl.distance, limit: null, unit: 'm',
      reason: `The nearest approach to line ${pl.id} is ${f(pl.distance, 2)} m (${pl.nearest}, slew ${f(pl.slew)}°); the required clearance must be set by the utility or a registered engineer (${pl.rule}).`,
    };
  }
  const ok = pl.distance >= pl.required;
  return {
    id: `power-line:${pl.id}`, ok, value: pl.distance, limit: pl.required, unit: 'm',
    reason: `The ${pl.nearest} comes within ${f(pl.distance, 2)} m of line ${pl.id} at slew ${f(pl.slew)}°; required ${f(pl.required, 2)} m (${pl.rule}), ${verdict(ok)}.`,
  };
}

const RIGGING_NAMES: Record<RiggingVerdict['element'], string> = { sling: 'Sling', shackle: 'Shackle', hook: 'Hook', 'snatch-block': 'Snatch block', winch: 'Winch' };

export function riggingCheck(r: RiggingVerdict, label = ''): Check {
  const id = `rigging:${r.element}:${r.id}${label ? ':upper-weight' : ''}`;
  if (r.refused) {
    return { id, ok: false, value: r.demand, limit: null, unit: 'kg', reason: `${label}${RIGGING_NAMES[r.element]} ${r.id} is not lifting rigging: ${r.refused} It cannot carry the ${f(r.demand, 0)} kg; over limit.` };
  }
  const ok = r.demand <= r.capacity;
  const what = r.element === 'winch' ? `Line pull on the winch is ${f(r.demand, 0)} kg against a rated pull of` : `${RIGGING_NAMES[r.element]} ${r.id} carries ${f(r.demand, 0)} kg against a capacity of`;
  const notes = [...r.assumptions, ...r.warnings].map((n) => ` ${n}`).join('');
  return {
    id, ok, value: r.demand, limit: r.capacity, unit: 'kg',
    reason: `${label}${what} ${f(r.capacity, 0)} kg (${r.detail}); ${verdict(ok)}, ${f((100 * r.demand) / r.capacity, 0)} % used.${notes}`,
  };
}

export function loadChartCheck(look: ChartLookup & { percent: number | null }, radius: number, limit: number, label = ''): Check {
  const id = `load-chart${label ? ':upper-weight' : ''}`;
  if (look.percent === null) {
    return { id, ok: false, value: null, limit, unit: '%', reason: `${label}No rated capacity for this lift: ${look.reason}. A lookup outside the chart is not extrapolated.` };
  }
  const ok = look.percent <= limit;
  return {
    id, ok, value: look.percent, limit, unit: '%',
    reason: `${label}At ${f(radius, 2)} m radius the hook load is ${f(look.percent)} % of the chart's rated ${f(look.rated ?? 0, 0)} kg (read at ${look.radiusUsed} m radius, ${look.boomLengthUsed} m boom, no interpolation); limit ${f(limit, 0)} %, ${verdict(ok)}.`,
  };
}
