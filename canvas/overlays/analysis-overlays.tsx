'use client';
/** The swing check drawn on the plan; filled in by canvas/analysis. */
export function AnalysisOverlays() {
  return null;
}
