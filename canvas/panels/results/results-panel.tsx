'use client';
/** Every check with value, limit, unit and a sentence; filled in with the analysis. */
export function ResultsPanel() {
  return <p className="text-sm text-ink-muted">Results appear when the truck and the load are placed.</p>;
}
