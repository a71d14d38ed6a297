import type { WeightLimit, WeightSensitivity } from '@/lib/lift/sensitivity';
import { formatNumber } from './number';

/**
 * The weight sensitivity in words, for the results panel and the plan document. Masses are written by the
 * caller's formatter (the panel's units, or both units in the document), so one set of words serves both.
 */
type Mass = (kg: number) => string;

/** "+18 %", "−12 %", "±0 %". */
export function changeWords(change: number): string {
  const r = Math.round(change);
  return r === 0 ? '±0 %' : `${r > 0 ? '+' : ''}${formatNumber(r)} %`;
}

/** What the limit is, in plain words. */
export function weightLimitTitle(l: WeightLimit): string {
  switch (l.kind) {
    case 'tipping-limit':
      return `the plan’s tipping limit (${formatNumber(l.limit)} % of tipping)`;
    case 'tipping':
      return 'the tipping point (100 % of tipping)';
    case 'load-chart':
      return `the plan’s share of the load chart (${formatNumber(l.limit)} %)`;
    case 'bearing':
      return `the ground’s allowable pressure under the ${l.name} pad`;
    case 'rigging':
      return `the working load limit of ${l.name}`;
  }
}

const NEVER_WORDS: Record<NonNullable<WeightLimit['never']>, string> = {
  'no-lever': 'not reached: the hook stays inside the tipping lines',
  'no-rating': 'no rating in the chart at this radius',
  refused: 'not lifting rigging: over limit at any weight',
  constant: 'does not change with the load',
  'tips-first': 'not reached before the truck would tip',
  'beyond-search': 'not reached by any weight looked at',
};

/** "41,200 lb (+18 %)", or why no weight reaches it. */
export function weightLimitFigure(l: WeightLimit, mass: Mass): string {
  if (l.loadMass === null && l.lighter) return `under ${mass(l.lighter.loadMass)}${l.lighter.change === null ? '' : ` (${changeWords(l.lighter.change)})`}, a lighter load`;
  if (l.loadMass === null) return NEVER_WORDS[l.never ?? 'beyond-search'];
  return l.change === null ? mass(l.loadMass) : `${mass(l.loadMass)} (${changeWords(l.change)})`;
}

/** The one line the plan shows: "Limits reached at 41,200 lb (+18 %): first the working load limit of the hook shackle." */
export function sensitivityHeadline(ws: WeightSensitivity, mass: Mass): string {
  const f = ws.first;
  const main = (() => {
    if (!f || f.loadMass === null) return 'No limit of the plan is reached as the load gets heavier, up to the weight that would tip the truck.';
    const at = weightLimitFigure(f, mass);
    if (f.loadMass <= ws.loadMass) return `Limits already reached at ${at}, at or below the planned weight: first ${weightLimitTitle(f)}.`;
    return `Limits reached at ${at}: first ${weightLimitTitle(f)}.`;
  })();
  const l = lighterLimit(ws);
  return l ? `${main} ${lighterWords(l, mass)}` : main;
}

/** The pad limit a lighter load would reach first (the highest such mass), if any. */
export function lighterLimit(ws: WeightSensitivity): WeightLimit | null {
  let best: WeightLimit | null = null;
  for (const l of ws.limits) if (l.lighter && (!best || l.lighter.loadMass > best.lighter!.loadMass)) best = l;
  return best;
}

/** "A lighter load would also reach one: the ground under the left rear pad below 3,300 lb (−50 %)." */
export function lighterWords(l: WeightLimit, mass: Mass): string {
  const x = l.lighter!;
  return `A lighter load would reach ${weightLimitTitle(l)}: under ${mass(x.loadMass)}${x.change === null ? '' : ` (${changeWords(x.change)})`}.`;
}

/** "Looked at from −10 % to +25 % of the planned weight (given)". */
export function bandWords(ws: WeightSensitivity, mass: Mass): string {
  const b = ws.band;
  const why = b.source === 'estimated-default' ? 'wider, as the weight is estimated' : b.source === 'input' ? 'as set for this plan' : 'as the weight is given';
  return `From ${mass(ws.loadMass * (1 - b.below / 100))} (−${formatNumber(b.below)} %) to ${mass(ws.loadMass * (1 + b.above / 100))} (+${formatNumber(b.above)} %), ${why}.`;
}

/** The limits in the order a heavier load reaches them; the ones never reached last. */
export function limitsInOrder(ws: WeightSensitivity): WeightLimit[] {
  return [...ws.limits].sort((a, b) => (a.loadMass ?? Infinity) - (b.loadMass ?? Infinity));
}
