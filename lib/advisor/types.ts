import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import type { Pt } from '@/lib/scene/geometry/vec';

/**
 * The placement advisor's contract. Site frame (m, degrees CCW from east) as in the scene document.
 * The pick point defaults to the load's position; the set point to where the scene's hook is at the
 * end of its swing. The usable area defaults to the document's own (null: anywhere clear of obstacles).
 */
export interface AdvisorSite {
  document: SceneDocument;
  model: TruckModel;
  pick?: Pt;
  set?: Pt;
  usableArea?: Pt[] | null;
}

export type AdvisorPhase = 'grid' | 'refine' | 'legs' | 'confirm';

export interface AdvisorOptions {
  /** Called now and then with the share of the work done (0–1). */
  onProgress?: (progress: { phase: AdvisorPhase; fraction: number }) => void;
  /** Checked between evaluations; when it returns true the search stops with AdvisorCancelled. */
  cancelled?: () => boolean;
}

export class AdvisorCancelled extends Error {
  constructor() {
    super('The placement search was cancelled.');
  }
}

/** Why the advisor cannot search at all (no truck, no load, a profile without geometry). */
export class AdvisorInputError extends Error {}

/** Where a candidate stands: slew axis, heading of the truck's +x, and each leg's extension (m). */
export interface Placement {
  x: number;
  y: number;
  heading: number;
  /** Extension of each leg in use, in the order of Evaluator.legs. */
  extensions: number[];
}

/** The figures of one placement from the exact analysis, SI. */
export interface PlacementFigures {
  percentOfTipping: number;
  tippingLimit: number;
  loadChartPercent: number | null;
  ratedLimit: number;
  highestPad: { support: string; name: string; pressure: number } | null;
  allowable: number;
  nearestClearance: { target: string; name: string; distance: number } | null;
  clearanceLimit: number;
  nearestPowerLine: { id: string; name: string; distance: number; required: number | null } | null;
}

export interface Proposal {
  rank: number;
  /** True when this is the scene's own placement, unchanged (no placement found did better). */
  current: boolean;
  truck: { x: number; y: number; heading: number };
  legs: { id: string; extension: number; stage: 'retracted' | 'intermediate' | 'full' | 'as set' }[];
  boom: { length: number; elevation: number };
  swing: SceneDocument['swing'];
  /** The least margin over the swing (margins.ts) and the check it belongs to. */
  leastMargin: { check: string; margin: number };
  figures: PlacementFigures;
  /** The scene with this placement applied. */
  document: SceneDocument;
}

export interface AdvisorResult {
  pick: Pt;
  set: Pt;
  /** The scene's own placement by the same measure; null when it cannot be analysed. */
  start: { leastMargin: { check: string; margin: number }; figures: PlacementFigures } | null;
  proposals: Proposal[];
  /** Full coarse analyses, exact analyses, and placements left out by their ceiling (they could not win). */
  evaluations: { coarse: number; exact: number; skipped: number };
  elapsedMs: number;
}
