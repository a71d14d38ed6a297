import type { Clearance, LiftResult } from '@/lib/lift';

/**
 * How far the load clears one truck part or obstacle: beside it or over it, whichever is more (the
 * engine's clearanceWithin passes a clearance when either reaches the limit); over it when they overlap
 * in plan (negative: the load would strike it).
 */
export const clearanceFigure = (c: Pick<Clearance, 'overlapsInPlan' | 'horizontal' | 'vertical'>) => (c.overlapsInPlan ? c.vertical : Math.max(c.horizontal, c.vertical));

/**
 * A revision's headline figures for the timeline and the compare table, read from the engine's result:
 * the worst % of tipping over the swing, the highest ground pressure under any pad, the least clearance
 * to a truck part or obstacle (clearanceFigure). SI: kPa, m.
 */
export interface HeadlineFigures {
  worstPercentOfTipping: number;
  worstSlew: number;
  governingLine: string;
  highestPadPressure: number | null;
  highestPadPressureSupport: string | null;
  /** What people call that pad ("left rear"): the engine's name for it. */
  highestPadPressureSupportName: string | null;
  leastClearance: number | null;
  leastClearanceTarget: string | null;
  /** What people call that part or obstacle (its label on the plan), never its id. */
  leastClearanceTargetName: string | null;
}

export function headlineFigures(r: Pick<LiftResult, 'worstCase' | 'reactions' | 'clearances'>): HeadlineFigures {
  let pad: { pressure: number; support: string; name: string } | null = null;
  for (const m of r.reactions.maxima) if (!pad || m.pressure > pad.pressure) pad = { pressure: m.pressure, support: m.support, name: m.name };
  let gap: { value: number; target: string; name: string } | null = null;
  for (const c of r.clearances) {
    const value = clearanceFigure(c);
    if (!gap || value < gap.value) gap = { value, target: c.target, name: c.name };
  }
  return {
    worstPercentOfTipping: r.worstCase.percentOfTipping,
    worstSlew: r.worstCase.slew,
    governingLine: r.worstCase.line,
    highestPadPressure: pad?.pressure ?? null,
    highestPadPressureSupport: pad?.support ?? null,
    highestPadPressureSupportName: pad?.name ?? null,
    leastClearance: gap?.value ?? null,
    leastClearanceTarget: gap?.target ?? null,
    leastClearanceTargetName: gap?.name ?? null,
  };
}

/** One save on the revision timeline (GET /api/scenes/{id}/revisions). */
export interface RevisionSummary {
  revision: number;
  savedAt: string;
  author: string;
  /**
   * The scene's status for its latest revision. For an earlier one, the latest review decision on that
   * revision ("approved", "returned", "withdrawn", or "submitted" while pending), else "superseded".
   */
  status: string;
  /** Headline figures, or null when the engine had nothing to compute (see `problem`). */
  figures: HeadlineFigures | null;
  problem: { code: string; message: string } | null;
}
