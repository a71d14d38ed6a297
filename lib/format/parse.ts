import { ftToM, inToM, lbToKg, type UnitSystem } from '@/lib/units';

/**
 * The app's one reader of typed numbers, lengths and masses (fields, the calibration dialog, equipment
 * forms). What it reads is what formatNumber and the quantity formatters write, so a value shown in a
 * field reads back as the same figure. Every reader answers SI, or null when it cannot read the text.
 */

const NUMBER = /^[-−]?(\d+(\.\d*)?|\.\d+)(e[-+]?\d+)?$/i;
/** "1,250" or "12,500.5": commas that group thousands. */
const GROUPED = /^[-−]?\d{1,3}(,\d{3})+(\.\d+)?$/;

/**
 * A plain number: "1,250", "-3.5", "−3.5", "4.2e-1", or "12,5" with a decimal comma (a comma that does not
 * group thousands). Null for blank or unreadable text.
 */
export function parseNumber(text: string): number | null {
  let t = text.trim();
  if (t === '') return null;
  if (GROUPED.test(t)) t = t.replace(/,/g, '');
  else if (/^[-−]?\d+,\d+$/.test(t)) t = t.replace(',', '.');
  if (!NUMBER.test(t)) return null;
  return Number(t.replace('−', '-'));
}

/** Feet and inches: 41' 6", 41'6, 41 ft 6 in, 41′ 6″; inches alone: 498" or 498 in. Metres, or null. */
function feetInches(t: string): number | null {
  const s = t.replace(/[′’]/g, "'").replace(/[″”]/g, '"');
  const fi = s.match(/^([-−]?[\d,]*\.?\d+)\s*(?:'|ft)\s*(?:([\d.]+)\s*(?:"|in)?)?$/i);
  if (fi) {
    const negative = /^[-−]/.test(fi[1]);
    const ft = parseNumber(fi[1].replace(/^[-−]/, ''));
    const inch = fi[2] === undefined ? 0 : parseNumber(fi[2]);
    if (ft === null || inch === null) return null;
    const m = ftToM(ft) + inToM(inch);
    return negative ? -m : m;
  }
  const inches = s.match(/^(.+?)\s*(?:"|in)$/i);
  if (inches) {
    const v = parseNumber(inches[1]);
    return v === null ? null : inToM(v);
  }
  return null;
}

/**
 * A length typed in the viewer's units, in metres. A bare number is feet (imperial) or metres (metric);
 * a unit typed with it wins either way: ft and in (41' 6", 498"), m, cm or mm.
 */
export function parseLength(text: string, units: UnitSystem): number | null {
  const t = text.trim();
  const fi = feetInches(t);
  if (fi !== null) return fi;
  const metric = t.match(/^(.+?)\s*(mm|cm|m)$/i);
  if (metric) {
    const v = parseNumber(metric[1]);
    const per = { mm: 0.001, cm: 0.01, m: 1 }[metric[2].toLowerCase() as 'mm' | 'cm' | 'm'];
    return v === null ? null : v * per;
  }
  const bare = parseNumber(t);
  if (bare === null) return null;
  return units === 'metric' ? bare : ftToM(bare);
}

/** A mass typed in the viewer's units, in kg: a bare number is pounds (imperial) or kilograms (metric); "lb", "kg" or "t" (metric tonnes) win. */
export function parseMass(text: string, units: UnitSystem): number | null {
  const t = text.trim();
  const unit = t.match(/^(.+?)\s*(lbs?|kg|t)$/i);
  if (unit) {
    const v = parseNumber(unit[1]);
    if (v === null) return null;
    const u = unit[2].toLowerCase();
    return u.startsWith('lb') ? lbToKg(v) : u === 't' ? v * 1000 : v;
  }
  const bare = parseNumber(t);
  if (bare === null) return null;
  return units === 'metric' ? bare : lbToKg(bare);
}
