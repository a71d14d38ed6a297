import type { LoadChart } from './truck-spec';

/**
 * Load chart lookup with no upward interpolation: the next greater (or equal) radius and the next longer
 * (or equal) boom length in the chart (common practice, no published source). A radius or boom length
 * beyond the chart is a failed lookup, never an extrapolation. A radius or boom shorter than the first
 * row or column uses that first row or column, which is the next greater one.
 */
export interface RatedLookup {
  /** Rated load, kg; null when the chart gives none there. */
  rated: number | null;
  radiusUsed: number | null;
  boomLengthUsed: number | null;
  reason: string | null;
}

// Entry rounding: a radius typed as 6.096 m for 20 ft should still find the 6.096 row.
const TOLERANCE = 1e-3;

function nextAtOrAbove(values: readonly number[], v: number): number {
  for (let i = 0; i < values.length; i++) if (values[i] >= v - TOLERANCE) return i;
  return -1;
}

/** The profile's chart, rated[radius row][boom column], looked up at one radius and boom length (m). */
export function lookupRated(chart: Pick<LoadChart, 'radii' | 'boomLengths' | 'rated'>, radius: number, boomLength: number): RatedLookup {
  const r = nextAtOrAbove(chart.radii, radius);
  const b = nextAtOrAbove(chart.boomLengths, boomLength);
  if (r < 0) {
    return { rated: null, radiusUsed: null, boomLengthUsed: b < 0 ? null : chart.boomLengths[b], reason: `radius ${radius.toFixed(2)} m is beyond the chart's largest radius (${chart.radii[chart.radii.length - 1]} m)` };
  }
  if (b < 0) {
    return { rated: null, radiusUsed: chart.radii[r], boomLengthUsed: null, reason: `boom length ${boomLength.toFixed(2)} m is beyond the chart's longest boom (${chart.boomLengths[chart.boomLengths.length - 1]} m)` };
  }
  const rated = chart.rated[r]?.[b] ?? null;
  return {
    rated,
    radiusUsed: chart.radii[r],
    boomLengthUsed: chart.boomLengths[b],
    reason: rated === null ? `the chart gives no rating at ${chart.radii[r]} m radius with ${chart.boomLengths[b]} m of boom` : null,
  };
}

/**
 * The lift engine's chart shape is indexed the other way round, rated[boom][radius]; the editor grid and
 * the stored profile are rated[radius][boom] because a printed chart reads that way.
 */
export function toEngineLoadChart(chart: Pick<LoadChart, 'radii' | 'boomLengths' | 'rated'>) {
  return {
    radii: [...chart.radii],
    boomLengths: [...chart.boomLengths],
    rated: chart.boomLengths.map((_, b) => chart.radii.map((_, r) => chart.rated[r]?.[b] ?? null)),
  };
}
