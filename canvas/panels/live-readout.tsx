'use client';
/** Percent of tipping at the current slew; filled in with the analysis. */
export function LiveReadout() {
  return null;
}
