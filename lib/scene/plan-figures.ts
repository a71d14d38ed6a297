import type { LiftResult } from '@/lib/lift';
import { headlineFigures } from '@/lib/replay/headline-figures';

/**
 * The three figures a supervisor scans a list for, from the engine's result: the worst % of tipping over the
 * swing, the highest pad ground pressure as % of the allowable, and the least clearance to a truck part or
 * obstacle (m; headlineFigures' rule). `beyond` counts the checks over the plan's limits. Only the nominal
 * weight's checks count here; the upper end of an estimated weight stays in the full results.
 */
export interface PlanFigures {
  percentOfTipping: number | null;
  percentOfBearing: number | null;
  leastClearance: number | null;
  beyond: number;
}

export function planFigures(r: Pick<LiftResult, 'worstCase' | 'reactions' | 'clearances' | 'checks'>): PlanFigures {
  const head = headlineFigures(r);
  let bearing: number | null = null;
  for (const c of r.checks) {
    if (c.code !== 'bearing' || c.upperWeight || c.ratio === null) continue;
    bearing = Math.max(bearing ?? 0, c.ratio * 100);
  }
  return {
    percentOfTipping: Number.isFinite(head.worstPercentOfTipping) ? head.worstPercentOfTipping : null,
    percentOfBearing: bearing,
    leastClearance: head.leastClearance,
    beyond: r.checks.filter((c) => !c.ok && !c.upperWeight).length,
  };
}

/** A scene's list figures, or why there are none (an unfinished sketch: no truck or load yet). */
export type ListFigures = (PlanFigures & { problem: null }) | { percentOfTipping: null; percentOfBearing: null; leastClearance: null; beyond: null; problem: string };
