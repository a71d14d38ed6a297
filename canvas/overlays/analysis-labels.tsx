'use client';
/** Screen-space labels of the swing check; filled in with the analysis. */
export function AnalysisLabels() {
  return null;
}
