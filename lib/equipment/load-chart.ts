import { chartLookup, type ChartLookup } from '@/lib/lift/load-chart';
import type { LoadChart } from './truck-spec';

type ChartGrid = Pick<LoadChart, 'radii' | 'boomLengths' | 'rated'>;

/**
 * The lift engine's chart shape is indexed the other way round, rated[boom][radius]; the editor grid and
 * the stored profile are rated[radius][boom] because a printed chart reads that way.
 */
export function toEngineLoadChart(chart: ChartGrid) {
  return {
    radii: [...chart.radii],
    boomLengths: [...chart.boomLengths],
    rated: chart.boomLengths.map((_, b) => chart.radii.map((_, r) => chart.rated[r]?.[b] ?? null)),
  };
}

/**
 * A profile's chart looked up at one radius and boom length (m) through the engine's lookup: no upward
 * interpolation, the next greater radius and the next longer boom (common practice, no published source);
 * beyond the chart there is no rating.
 */
export function lookupRated(chart: ChartGrid, radius: number, boomLength: number): ChartLookup {
  return chartLookup(toEngineLoadChart(chart), radius, boomLength);
}
