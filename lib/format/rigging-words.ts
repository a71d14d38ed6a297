import type { Check } from '@/lib/lift/checks';
import { formatNumber } from './number';
import { formatAngle } from './quantity';

/**
 * The words of a rigging check (part of the one check formatter, lib/format/checks.ts). Everything comes
 * from the check's facts; `q` writes a mass in the viewer's units.
 */
type RiggingCheck = Extract<Check, { code: 'rigging' }>;

const MATERIAL_WORDS: Record<string, string> = { 'round-sling': 'round sling', 'web-sling': 'web sling', 'wire-rope': 'wire rope sling', chain: 'chain sling', 'recovery-strap': 'recovery strap', other: 'sling' };

export const elementWords = (e: RiggingCheck['facts']['element']) => ({ sling: 'Sling', shackle: 'Shackle', hook: 'Hook', 'snatch-block': 'Snatch block', winch: 'Winch' })[e];

const deg = (a: number | null) => formatAngle(a ?? 90, 0);

function slingWords(f: RiggingCheck['facts']): string {
  const what = f.colour ? `${f.colour} round sling` : f.material === 'chain' ? `grade ${f.grade ?? '?'} chain${f.size ? ` ${f.size} in` : ''}` : MATERIAL_WORDS[f.material ?? 'other'];
  const choke = f.choke && !f.choke.assumed ? `, choked at ${deg(f.choke.angle)}` : '';
  return `${f.legs} × ${what}, ${f.hitch} hitch${choke} at ${deg(f.angleFromHorizontal)} from horizontal`;
}

function how(f: RiggingCheck['facts'], q: (kg: number) => string): string {
  const legs = f.legs ?? 1;
  switch (f.element) {
    case 'sling':
      return slingWords(f);
    case 'shackle':
      return `${f.size ? `${f.size} in shackle` : 'shackle'}, ${legs > 1 ? `one in each of ${legs} legs` : 'single leg'} at ${deg(f.angleFromHorizontal)} from horizontal`;
    case 'hook':
      return legs === 1 && f.angleFromHorizontal === 90 ? 'carrying the whole load' : `one on each of ${legs} legs at ${deg(f.angleFromHorizontal)} from horizontal`;
    case 'snatch-block': {
      const from = f.linePullFrom === 'winch' ? ' (the winch’s line pull)' : f.linePullFrom === 'hook-load' ? ' (no line pull given: the whole hook load)' : '';
      return `${deg(f.lineAngle)} between its lines, line pull ${q(f.linePull ?? 0)}${from}; load 2·T·cos(θ/2)`;
    }
    default:
      return '';
  }
}

/** What the figure rests on and what to look at: assumptions and warnings, as sentences. */
export function riggingNotes(f: RiggingCheck['facts']): { assumptions: string[]; warnings: string[] } {
  const out: string[] = [];
  const warnings: string[] = [];
  if (f.legs !== null && f.legsCounted !== null && f.legs > f.legsCounted) out.push(`${f.legs} legs are rated as ${f.legsCounted} carrying the load (ASME B30.9, OSHA 1910.184).`);
  if (f.choke?.assumed) out.push(`No choke angle given: a free-hanging choke (about ${deg(f.choke.angle)}, factor ${formatNumber(f.choke.factor, 2)}) is assumed.`);
  if (f.bend && f.bend.factor === null) out.push(`No D/d reduction table for this material: the basket rating is used as given at D/d ${formatNumber(f.bend.ratio, 1)}.`);
  if (f.bend && f.bend.factor !== null && f.bend.factor < 1) out.push(`Basket rating reduced to ${formatNumber(100 * f.bend.factor)} % for a bend of D/d ${formatNumber(f.bend.ratio, 1)}.`);
  if (f.lowAngle && f.angleFromHorizontal !== null) {
    const pull = 1 / Math.sin((f.angleFromHorizontal * Math.PI) / 180);
    warnings.push(`The leg angle is under 30° from horizontal: each leg pulls ${formatNumber(pull, 2)} × its share of the load; avoid angles under 30°.`);
  }
  return { assumptions: out, warnings };
}

export function riggingSentence(c: RiggingCheck, name: string, q: (kg: number) => string, verdict: string): string {
  const f = c.facts;
  if (f.element === 'winch') {
    const lead = f.leadSheaves === 1 ? '1 lead sheave' : `${f.leadSheaves ?? 0} lead sheaves`;
    return `Line pull on the winch is ${q(c.value ?? 0)} against a rated pull of ${q(c.limit ?? 0)} (${f.parts} parts of line over ${f.sheaves} sheaves, ${lead}, lead-line factor ${formatNumber(f.leadLineFactor ?? 0, 4)}) (${verdict}).`;
  }
  const head = `${elementWords(f.element)} ${name}`;
  if (f.refused) return `${head} is not lifting rigging: ${f.refused.reason} It is given no capacity for the ${q(c.value ?? 0)} (${verdict}).`;
  const n = riggingNotes(f);
  const notes = [...n.assumptions, ...n.warnings];
  return `${head} (${how(f, q)}) carries ${q(c.value ?? 0)} against a capacity of ${q(c.limit ?? 0)} (${verdict}).${notes.length ? ` ${notes.join(' ')}` : ''}`;
}
