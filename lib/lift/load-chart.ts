import { LiftError } from './errors';
import type { LoadChart } from './schema';

/**
 * Percent of rated capacity from a load chart entered for the truck. No upward interpolation: the
 * lookup takes the next greater radius and the next longer boom in the chart (common practice, no
 * published source). A radius or boom length beyond the chart is a failed lookup, never an extrapolation.
 */
export interface ChartLookup {
  /** Rated capacity, kg; null when the chart gives none there. */
  rated: number | null;
  radiusUsed: number | null;
  boomLengthUsed: number | null;
  /**
   * Why there is no rating, when there is none: the radius or the boom is beyond the chart, or the chart
   * leaves that cell empty. `chartLimit` is the chart's largest radius or longest boom (m) for the first two.
   */
  missing: { why: 'radius-beyond-chart' | 'boom-beyond-chart' | 'no-rating'; chartLimit: number | null } | null;
}

const ascending = (xs: readonly number[]) => xs.every((x, i) => i === 0 || x > xs[i - 1]);

export function validateLoadChart(chart: LoadChart): void {
  if (!ascending(chart.radii)) throw new LiftError('invalid-load-chart', 'The load chart radii must be in ascending order without repeats.', 'loadChart.radii');
  if (!ascending(chart.boomLengths)) {
    throw new LiftError('invalid-load-chart', 'The load chart boom lengths must be in ascending order without repeats.', 'loadChart.boomLengths');
  }
  if (chart.rated.length !== chart.boomLengths.length) {
    throw new LiftError('invalid-load-chart', `The load chart has ${chart.boomLengths.length} boom lengths but ${chart.rated.length} rows of ratings.`, 'loadChart.rated');
  }
  chart.rated.forEach((row, b) => {
    if (row.length !== chart.radii.length) {
      throw new LiftError('invalid-load-chart', `Row ${b + 1} of the load chart has ${row.length} ratings for ${chart.radii.length} radii.`, `loadChart.rated.${b}`);
    }
  });
}

/** Smallest chart value ≥ v (with a 1 mm allowance for entry rounding), or −1. */
function nextAtOrAbove(values: readonly number[], v: number): number {
  for (let i = 0; i < values.length; i++) if (values[i] >= v - 1e-3) return i;
  return -1;
}

export function chartLookup(chart: LoadChart, radius: number, boomLength: number): ChartLookup {
  const r = nextAtOrAbove(chart.radii, radius);
  const b = nextAtOrAbove(chart.boomLengths, boomLength);
  if (r < 0) {
    return { rated: null, radiusUsed: null, boomLengthUsed: b < 0 ? null : chart.boomLengths[b], missing: { why: 'radius-beyond-chart', chartLimit: chart.radii[chart.radii.length - 1] } };
  }
  if (b < 0) {
    return { rated: null, radiusUsed: chart.radii[r], boomLengthUsed: null, missing: { why: 'boom-beyond-chart', chartLimit: chart.boomLengths[chart.boomLengths.length - 1] } };
  }
  const rated = chart.rated[b][r];
  return {
    rated,
    radiusUsed: chart.radii[r],
    boomLengthUsed: chart.boomLengths[b],
    missing: rated === null ? { why: 'no-rating', chartLimit: null } : null,
  };
}

/** Hook load as a percent of the rated capacity, or null when the chart gives no rating. */
export function percentOfRated(chart: LoadChart, radius: number, boomLength: number, hookLoad: number): ChartLookup & { percent: number | null } {
  const look = chartLookup(chart, radius, boomLength);
  return { ...look, percent: look.rated === null ? null : (100 * hookLoad) / look.rated };
}
