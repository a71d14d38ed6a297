import { bodyClear, padClear, type Ground } from './ground';
import type { Evaluator } from './evaluate';
import { AdvisorCancelled, type AdvisorOptions, type Placement } from './types';

/**
 * The optimiser: maximise the least margin over truck position, heading and leg extensions.
 * 1. A grid over the positions from which the boom reaches both points, every HEADING_STEP°, with each leg
 *    out as far as its stages allow where its pad stands clear (longer legs widen the support polygon).
 * 2. From the best distinct grid points and the scene's own placement, a compass search (pattern search,
 *    Hooke & Jeeves 1961; Kolda, Lewis & Torczon 2003) on x, y and heading, halving its steps.
 * 3. For the best few, every combination of the legs' stages.
 * Candidates are scored with the engine's coarse mode; search.ts's caller confirms with the exact one.
 */
export const HEADING_STEP = 15;
/** Stops of the compass search: 5 cm and 0.25° (well inside the 2° asked of the heading). */
const MIN_MOVE = 0.05;
const MIN_TURN = 0.25;

export interface Scored {
  pl: Placement;
  score: number;
}

export interface Reach {
  min: number;
  max: number;
}

export class Search {
  private tick = 0;

  constructor(
    private readonly ev: Evaluator,
    private readonly ground: Ground,
    private readonly reach: Reach,
    private readonly options: AdvisorOptions,
  ) {}

  private check(): void {
    if ((++this.tick & 15) === 0 && this.options.cancelled?.()) throw new AdvisorCancelled();
  }

  /** Stage extensions of each leg, longest first. */
  stages(): number[][] {
    return this.ev.legs.map((l) => {
      const s = [l.full - l.retracted, ...(l.intermediate !== null ? [l.intermediate - l.retracted] : []), 0];
      return [...new Set(s.map((v) => Math.max(0, v)))].sort((a, b) => b - a);
    });
  }

  reaches(x: number, y: number): boolean {
    const { pick, set } = this.ev;
    const a = Math.hypot(pick.x - x, pick.y - y), b = Math.hypot(set.x - x, set.y - y);
    return Math.max(a, b) <= this.reach.max && Math.max(a, b) >= this.reach.min;
  }

  /** Each leg at its longest stage whose pad stands clear; null when the body or some leg cannot stand. */
  longestLegs(x: number, y: number, heading: number): number[] | null {
    if (!bodyClear(this.ground, this.ev.model, x, y, heading, this.ev.legs)) return null;
    const out: number[] = [];
    const stages = this.stages();
    for (let i = 0; i < this.ev.legs.length; i++) {
      const ext = stages[i].find((e) => padClear(this.ground, this.ev.legs[i], e, x, y, heading));
      if (ext === undefined) return null;
      out.push(ext);
    }
    return out;
  }

  /** Coarse score of a placement, −Infinity where it cannot stand or reach. */
  score(pl: Placement): number {
    this.check();
    if (!this.reaches(pl.x, pl.y)) return -Infinity;
    return this.ev.coarse(pl);
  }

  at(x: number, y: number, heading: number): Scored {
    const extensions = this.reaches(x, y) ? this.longestLegs(x, y, heading) : null;
    if (!extensions) return { pl: { x, y, heading, extensions: [] }, score: -Infinity };
    const pl = { x, y, heading, extensions };
    return { pl, score: this.score(pl) };
  }

  grid(bounds: { minX: number; minY: number; maxX: number; maxY: number }, spacing: number, progress: (f: number) => void): Scored[] {
    const out: Scored[] = [];
    const nx = Math.max(1, Math.round((bounds.maxX - bounds.minX) / spacing));
    const ny = Math.max(1, Math.round((bounds.maxY - bounds.minY) / spacing));
    for (let i = 0; i <= nx; i++) {
      for (let j = 0; j <= ny; j++) {
        const x = bounds.minX + ((bounds.maxX - bounds.minX) * i) / nx;
        const y = bounds.minY + ((bounds.maxY - bounds.minY) * j) / ny;
        if (!this.reaches(x, y)) continue;
        for (let h = 0; h < 360; h += HEADING_STEP) {
          const s = this.at(x, y, h);
          if (s.score > -Infinity) out.push(s);
        }
      }
      progress((i + 1) / (nx + 1));
    }
    return out.sort((a, b) => b.score - a.score);
  }

  /** Compass search on x, y and heading; the legs follow the pose (longest clear) unless `fixedLegs`. */
  refine(start: Scored, spacing: number, fixedLegs = false, budget = 160): Scored {
    let best = start;
    let dxy = spacing / 2;
    let dh = HEADING_STEP / 2;
    let used = 0;
    const moveTo = (x: number, y: number, h: number): Scored => {
      used++;
      if (!fixedLegs) return this.at(x, y, h);
      const pl = { ...best.pl, x, y, heading: h };
      const ok = bodyClear(this.ground, this.ev.model, x, y, h, this.ev.legs) && this.ev.legs.every((l, i) => padClear(this.ground, l, pl.extensions[i], x, y, h));
      return { pl, score: ok ? this.score(pl) : -Infinity };
    };
    while ((dxy >= MIN_MOVE || dh >= MIN_TURN) && used < budget) {
      const { x, y, heading } = best.pl;
      const moves: [number, number, number][] = [];
      if (dxy >= MIN_MOVE) moves.push([x + dxy, y, heading], [x - dxy, y, heading], [x, y + dxy, heading], [x, y - dxy, heading]);
      if (dh >= MIN_TURN) moves.push([x, y, heading + dh], [x, y, heading - dh]);
      let improved = false;
      for (const [mx, my, mh] of moves) {
        const s = moveTo(mx, my, ((mh % 360) + 360) % 360);
        if (s.score > best.score) {
          best = s;
          improved = true;
          break;
        }
      }
      if (!improved) {
        dxy /= 2;
        dh /= 2;
      }
    }
    return best;
  }

  /** Every combination of the legs' stages at this pose (each pad clear); the best. */
  bestLegs(s: Scored): Scored {
    const stages = this.stages();
    const { x, y, heading } = s.pl;
    const options = stages.map((list, i) => list.filter((e) => padClear(this.ground, this.ev.legs[i], e, x, y, heading)));
    if (!bodyClear(this.ground, this.ev.model, x, y, heading, this.ev.legs) || options.some((o) => o.length === 0)) return s;
    let best = s;
    const walk = (i: number, ext: number[]) => {
      if (i === options.length) {
        const pl = { x, y, heading, extensions: [...ext] };
        const score = this.score(pl);
        if (score > best.score) best = { pl, score };
        return;
      }
      for (const e of options[i]) walk(i + 1, [...ext, e]);
    };
    walk(0, []);
    return best;
  }
}

/** The best `n` candidates that are not the same place as a better one. */
export function distinct(list: readonly Scored[], n: number, metres = 1, degrees = 10): Scored[] {
  const out: Scored[] = [];
  for (const s of list) {
    if (out.length >= n) break;
    if (!out.some((o) => Math.hypot(o.pl.x - s.pl.x, o.pl.y - s.pl.y) < metres && Math.abs(((o.pl.heading - s.pl.heading + 540) % 360) - 180) < degrees)) out.push(s);
  }
  return out;
}
