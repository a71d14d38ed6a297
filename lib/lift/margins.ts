import type { LiftResult } from './result';

/**
 * Margins: how much of each limit is left, as one comparable number per check, so that placements can
 * be ranked by their least margin. An at-most limit (percent of tipping, load chart use, pad pressure)
 * leaves 1 − value/limit; an at-least limit (a clearance) leaves (value − limit)/scale, capped at
 * CLEARANCE_MARGIN_CAP because a gap far beyond its limit says nothing about the placement. A figure
 * that cannot be checked (no chart rating, a clearance set by the utility) leaves −Infinity. Rigging is
 * left out: it does not change with the placement.
 */
export interface Margin {
  /** The check id of the engine result ("stability", "bearing:FL", "clearance:cab:boom", ...). */
  id: string;
  margin: number;
}

/** A clearance margin of 1 means a gap twice its limit (or the limit plus 0.1 m for tiny limits). */
export const CLEARANCE_MARGIN_CAP = 1;
/** Smallest scale of a clearance margin, m, so that a limit of 0 still gives finite margins. */
const MIN_SCALE = 0.1;

export const clearanceScale = (limit: number) => Math.max(limit, MIN_SCALE);

export const atMost = (value: number | null, limit: number | null) => (value === null || limit === null || !(limit > 0) ? -Infinity : 1 - value / limit);
export const atLeast = (value: number | null, limit: number | null) =>
  value === null || limit === null ? -Infinity : Math.min(CLEARANCE_MARGIN_CAP, (value - limit) / clearanceScale(limit));

const MARGIN_CODES = new Set(['stability', 'bearing', 'load-chart', 'clearance', 'power-line']);

/** Margins of an exact analysis, from its checks. */
export function resultMargins(r: LiftResult): Margin[] {
  return r.checks.filter((c) => MARGIN_CODES.has(c.code)).map((c) => {
    if (c.code === 'clearance' && c.facts.part === 'load') {
      // The load clears a part beside it or above it: the better of the two gaps counts (checks.ts).
      return { id: c.id, margin: atLeast(Math.max(c.facts.horizontal, c.facts.vertical), c.limit) };
    }
    return { id: c.id, margin: c.sense === 'at-most' ? atMost(c.value, c.limit) : atLeast(c.value, c.limit) };
  });
}

/** The least of a set of margins, with the check it belongs to. */
export function leastMargin(ms: readonly Margin[]): Margin {
  let worst: Margin = { id: '', margin: Infinity };
  for (const m of ms) if (m.margin < worst.margin) worst = m;
  return worst;
}
