import type { LiftResult } from '@/lib/lift';

/**
 * A revision's headline figures for the timeline and the compare table, read from the engine's result:
 * the worst % of tipping over the swing, the highest ground pressure under any pad, the least clearance
 * to a truck part or obstacle (the figure its clearance check reports: the plan gap, or the height above
 * the part's top where the load passes over it). SI: kPa, m.
 */
export interface HeadlineFigures {
  worstPercentOfTipping: number;
  worstSlew: number;
  governingLine: string;
  highestPadPressure: number | null;
  highestPadPressureSupport: string | null;
  leastClearance: number | null;
  leastClearanceTarget: string | null;
}

export function headlineFigures(r: Pick<LiftResult, 'worstCase' | 'reactions' | 'clearances'>): HeadlineFigures {
  let pad: { pressure: number; support: string } | null = null;
  for (const m of r.reactions.maxima) if (!pad || m.pressure > pad.pressure) pad = { pressure: m.pressure, support: m.support };
  let gap: { value: number; target: string } | null = null;
  for (const c of r.clearances) {
    const value = c.overlapsInPlan ? c.vertical : c.horizontal;
    if (!gap || value < gap.value) gap = { value, target: c.target };
  }
  return {
    worstPercentOfTipping: r.worstCase.percentOfTipping,
    worstSlew: r.worstCase.slew,
    governingLine: r.worstCase.line,
    highestPadPressure: pad?.pressure ?? null,
    highestPadPressureSupport: pad?.support ?? null,
    leastClearance: gap?.value ?? null,
    leastClearanceTarget: gap?.target ?? null,
  };
}
