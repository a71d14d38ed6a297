import type { Check, CheckStatus, CheckSubject } from '@/lib/lift/checks';
import type { TruckSide } from '@/lib/lift/names';
import type { PowerLineRule } from '@/lib/lift/power-lines';
import { ftToM, type UnitSystem } from '@/lib/units';
import { formatNumber } from './number';
import { elementWords, riggingSentence } from './rigging-words';
import { formatAngle, formatForce, formatLength, formatMass, formatPercent, formatQuantity } from './quantity';

/**
 * The one formatter from an engine check (lib/lift/checks.ts) to words, in the viewer's units. The results
 * panel, the plan overlays, the live readout, documents, the review queue and e-mails all write checks
 * through it. Subjects appear by name, never by id; tipping lines as their two pads with the short code
 * second. It reports figures and margins against the plan's limits and never judges a lift as a whole.
 */
export interface CheckWords {
  /** A short heading: "Ground under the left front pad". */
  title: string;
  /** The figure in the viewer's units ("2,400 psf"), or "—" when there is none. */
  value: string;
  /** The plan's limit ("limit 3,000 psf", "set by the utility"). */
  limit: string;
  /** "within limit", "near limit" or "over limit". */
  status: string;
  /** What is left or missing against the limit ("20 % below", "1′ 6″ to spare", "4.2 points over"). */
  margin: string;
  /** The whole check as one sentence (two at most). */
  sentence: string;
}

export const STATUS_WORDS: Record<CheckStatus, string> = { within: 'within limit', near: 'near limit', beyond: 'over limit' };

/** The headings results are grouped under, in order, by check code. */
export const CHECK_GROUPS: { title: string; codes: Check['code'][] }[] = [
  { title: 'Stability', codes: ['stability'] },
  { title: 'Ground', codes: ['bearing'] },
  { title: 'Clearances', codes: ['clearance'] },
  { title: 'Power lines', codes: ['power-line'] },
  { title: 'Rigging', codes: ['rigging'] },
  { title: 'Load chart', codes: ['load-chart'] },
];

const SIDE_WORDS: Record<TruckSide, string> = {
  front: 'front line', rear: 'rear line', left: 'left side', right: 'right side',
  'left front': 'left front corner', 'left rear': 'left rear corner', 'right front': 'right front corner', 'right rear': 'right rear corner',
};

/** "left rear–right rear pads (rear line, RL-RR)". */
export function tippingLineWords(line: { names: readonly string[]; side: TruckSide; code: string }): string {
  return `${line.names.join('–')} pads (${SIDE_WORDS[line.side]}, ${line.code})`;
}

/** "rear line (RL-RR)": a tipping line drawn on the plan, where its pads are in view. */
export function tippingLineShort(line: { side: TruckSide; code: string }): string {
  return `${SIDE_WORDS[line.side]} (${line.code})`;
}

/** Percent of tipping against the plan's limit, as points to spare or over ("12.6 points to spare"). */
export function tippingMargin(percent: number, limit: number): string {
  return `${formatNumber(Math.abs(limit - percent), 1)} points ${percent > limit ? 'over' : 'to spare'}`;
}

function subjectName(s: CheckSubject): string {
  if (s.kind === 'tipping-line' && s.line) return tippingLineWords({ names: s.names, side: s.line.side, code: s.line.code });
  return s.names[0] ?? s.ids[0] ?? '';
}

/** A percent limit as the plan states it: "85 %", or "82.5 %" when it was typed with a decimal. */
const planPercent = (pct: number) => formatPercent(pct, Number.isInteger(pct) ? 0 : 1);
const cap = (t: string) => t.charAt(0).toUpperCase() + t.slice(1);
const slewWords = (slew: number | null) => (slew === null ? '' : formatAngle(slew));

export function powerRuleWords(rule: PowerLineRule, required: string): string {
  switch (rule.source) {
    case 'table-a':
      return `29 CFR 1926.1408 Table A requires ${required} up to ${formatNumber(rule.upToKV ?? 0)} kV`;
    case 'unknown-voltage-350':
      return `29 CFR 1926.1408(a) requires ${required} for a line of unknown voltage confirmed at most 350 kV`;
    case 'unknown-voltage':
      return `29 CFR 1926.1409 requires ${required} for a line of unknown voltage`;
    case 'set-for-line':
      return `the utility or a registered engineer set ${required} for this line`;
    case 'over-table':
      return 'over 1,000 kV, 29 CFR 1926.1408 Table A leaves the clearance to the utility or a registered engineer';
  }
}

/** Margin against the limit in words: points for percents, a share for pressure and mass, a length for clearances. */
function marginWords(c: Check, units: UnitSystem): string {
  if (c.value === null || c.limit === null) return '';
  const over = c.status === 'beyond';
  if (c.quantity === 'percent') return tippingMargin(c.value, c.limit);
  if (c.quantity === 'length') return `${formatLength(Math.abs(c.value - c.limit), units)} ${over ? 'short' : 'to spare'}`;
  if (c.code === 'rigging') return c.facts.refused ? 'not lifting rigging' : `${formatNumber(100 * (c.ratio ?? 0))} % of capacity used`;
  return `${formatNumber(Math.abs(100 - 100 * (c.ratio ?? 0)))} % ${over ? 'above' : 'below'}`;
}

function titleOf(c: Check): string {
  const name = subjectName(c.subject);
  const base = (() => {
    switch (c.code) {
      case 'stability':
        return `Tipping about the ${name}`;
      case 'bearing':
        return `Ground under the ${name} pad`;
      case 'clearance': {
        const part = c.facts.part === 'boom' ? 'Boom' : 'Load';
        return c.subject.kind === 'truck-part' ? `${part} clear of the truck's ${name}` : `${part} clear of ${name}`;
      }
      case 'power-line':
        return `Power line ${name}`;
      case 'rigging':
        return c.facts.element === 'winch' ? 'Winch line pull' : `${elementWords(c.facts.element)} ${name}`;
      case 'load-chart':
        return 'Load chart';
    }
  })();
  return c.upperWeight ? `${base}, at the upper weight` : base;
}

function limitWords(c: Check, units: UnitSystem): string {
  if (c.limit === null) return c.code === 'power-line' ? 'set by the utility' : '—';
  const word = c.code === 'bearing' ? 'allowable' : c.code === 'power-line' ? 'required' : 'limit';
  const limit = c.quantity === 'percent' ? planPercent(c.limit) : formatQuantity(c.quantity, c.limit, units);
  return `${word} ${limit}`;
}

function body(c: Check, units: UnitSystem, verdict: string): string {
  const q = (v: number) => formatQuantity(c.quantity, v, units);
  const name = subjectName(c.subject);
  switch (c.code) {
    case 'stability':
      return `Worst case at slew ${slewWords(c.slew)}: the hook load is ${formatPercent(c.value ?? 0)} of the load that would tip the truck about the ${name}; the plan's limit is ${planPercent(c.limit ?? 0)} (${verdict}).`;
    case 'bearing': {
      const under = c.facts.underCribbing ? 'its cribbing' : 'the pad';
      return `The ${name} pad presses ${q(c.value ?? 0)} on the ground under ${under} at slew ${slewWords(c.slew)} (${formatForce(c.facts.force, units)}); allowable ${q(c.limit ?? 0)} (${verdict}).`;
    }
    case 'clearance': {
      const what = c.subject.kind === 'truck-part' ? `the truck's ${name}` : `“${name}”`;
      const f = c.facts;
      const limit = formatLength(c.limit ?? 0, units);
      if (f.part === 'boom') {
        const where = `${formatLength(f.alongBoom, units)} out along the boom, ${formatLength(f.height, units)} up`;
        if (f.strikes) return `The boom would strike ${what} at slew ${slewWords(c.slew)} (${where}) (${verdict}).`;
        return `The boom passes ${formatLength(c.value ?? 0, units)} from ${what} (nearest at slew ${slewWords(c.slew)}, ${where}); limit ${limit} (${verdict}).`;
      }
      if (!f.overlapsInPlan) {
        const above = f.horizontal < (c.limit ?? 0) && c.ok ? ` and ${formatLength(f.vertical, units)} above its top` : '';
        return `The load passes ${formatLength(f.horizontal, units)} from ${what} in plan (nearest at slew ${slewWords(c.slew)})${above}; limit ${limit} (${verdict}).`;
      }
      const bottom = `${formatLength(Math.abs(f.vertical), units)} ${f.vertical >= 0 ? 'above' : 'below'}`;
      const strike = f.conflict ? ': the load would strike it' : `; limit ${limit}`;
      return `The load passes over ${what} (from slew ${slewWords(c.slew)}) with its bottom ${bottom} its top${strike} (${verdict}).`;
    }
    case 'power-line': {
      const near = `the ${c.facts.nearest}`;
      if (c.limit === null) {
        return `The nearest approach to the line “${name}” is ${q(c.value ?? 0)} (${near}, at slew ${slewWords(c.slew)}); ${powerRuleWords(c.facts.rule, '')}: have the clearance set before the lift (${verdict}).`;
      }
      // The rule's own figure is in feet: shown exactly in feet-inches, or converted exactly to metres.
      const required = c.facts.rule.feet !== null ? formatLength(ftToM(c.facts.rule.feet), units) : q(c.limit);
      return `${cap(near)} comes within ${q(c.value ?? 0)} of the line “${name}” at slew ${slewWords(c.slew)}; ${powerRuleWords(c.facts.rule, required)} (${verdict}).`;
    }
    case 'rigging':
      return riggingSentence(c, name, q, verdict);
    case 'load-chart': {
      const f = c.facts;
      if (c.value === null || f.rated === null) {
        const m = f.missing;
        const why =
          m?.why === 'radius-beyond-chart'
            ? `the radius of ${formatLength(f.radius, units)} is beyond the chart's largest radius of ${formatLength(m.chartLimit ?? 0, units)}`
            : m?.why === 'boom-beyond-chart'
              ? `the boom length of ${formatLength(f.boomLength, units)} is beyond the chart's longest boom of ${formatLength(m.chartLimit ?? 0, units)}`
              : `the chart gives no rating at ${formatLength(f.radiusUsed ?? f.radius, units)} radius with ${formatLength(f.boomLengthUsed ?? f.boomLength, units)} of boom`;
        return `No rated capacity for this lift: ${why}. A lookup outside the chart is not extrapolated (${verdict}).`;
      }
      return `At ${formatLength(f.radius, units)} radius the hook load is ${formatPercent(c.value)} of the chart's rated ${formatMass(f.rated, units)} (read at ${formatLength(f.radiusUsed ?? 0, units)} radius and ${formatLength(f.boomLengthUsed ?? 0, units)} of boom, no interpolation); limit ${planPercent(c.limit ?? 0)} (${verdict}).`;
    }
  }
}

/** The check in words, in the viewer's units. */
export function describeCheck(c: Check, units: UnitSystem): CheckWords {
  const status = STATUS_WORDS[c.status];
  const margin = marginWords(c, units);
  const verdict = margin ? `${status}, ${margin}` : status;
  const prefix = c.upperWeight ? `At the upper weight (${formatNumber(c.upperWeight.percent)} % over, ${formatMass(c.upperWeight.loadMass, units)}): ` : '';
  return {
    title: titleOf(c),
    value: c.value === null ? '—' : formatQuantity(c.quantity, c.value, units),
    limit: limitWords(c, units),
    status,
    margin,
    sentence: prefix + body(c, units, verdict),
  };
}

/** The checks under their group headings, in the order of CHECK_GROUPS (empty groups left out). */
export function groupChecks(checks: readonly Check[]): { title: string; checks: Check[] }[] {
  return CHECK_GROUPS.map((g) => ({ title: g.title, checks: checks.filter((c) => g.codes.includes(c.code)) })).filter((g) => g.checks.length);
}

/** The results headline: how many checks are over the plan's limits. */
export function checksHeadline(checks: readonly Check[]): string {
  const over = checks.filter((c) => c.status === 'beyond').length;
  const near = checks.filter((c) => c.status === 'near').length;
  if (over) return `${over} of ${checks.length} checks over the plan's limits`;
  return `All ${checks.length} checks within the plan's limits${near ? `, ${near} near them` : ''}`;
}
