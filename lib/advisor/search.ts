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

  /**
   * Coarse score of a placement, −Infinity where it cannot stand or reach. With a `floor` (the best score
   * the caller has), a placement that cannot beat it may get its ceiling instead (Evaluator.coarse): only
   * "better than the floor" is decided by it, the same way as with the full score.
   */
  score(pl: Placement, floor = -Infinity): number {
    this.check();
    if (!this.reaches(pl.x, pl.y)) return -Infinity;
    return this.ev.coarse(pl, floor);
  }

  at(x: number, y: number, heading: number, floor = -Infinity): Scored {
    const extensions = this.reaches(x, y) ? this.longestLegs(x, y, heading) : null;
    if (!extensions) return { pl: { x, y, heading, extensions: [] }, score: -Infinity };
    const pl = { x, y, heading, extensions };
    return { pl, score: this.score(pl, floor) };
  }

  /**
   * The grid's placements, best first, as far as `keep` needs them: every placement that could be among
   * the `keep.n` distinct best (distinct() with its metres and degrees). Each standing placement gets its
   * ceiling (Evaluator.ceiling) first; they are scored fully in falling order of ceiling, and the rest are
   * left out once the next ceiling is below the n-th distinct best score, which none of them can then
   * reach. The distinct best are the same as scoring every placement (ties keep the grid's order).
   */
  grid(bounds: { minX: number; minY: number; maxX: number; maxY: number }, spacing: number, keep: { n: number; metres: number; degrees: number }, progress: (f: number) => void): Scored[] {
    const candidates: { pl: Placement; order: number; ceiling: number; p: NonNullable<ReturnType<Evaluator['prepared']>> }[] = [];
    const nx = Math.max(1, Math.round((bounds.maxX - bounds.minX) / spacing));
    const ny = Math.max(1, Math.round((bounds.maxY - bounds.minY) / spacing));
    for (let i = 0; i <= nx; i++) {
      for (let j = 0; j <= ny; j++) {
        const x = bounds.minX + ((bounds.maxX - bounds.minX) * i) / nx;
        const y = bounds.minY + ((bounds.maxY - bounds.minY) * j) / ny;
        if (!this.reaches(x, y)) continue;
        for (let h = 0; h < 360; h += HEADING_STEP) {
          this.check();
          const extensions = this.longestLegs(x, y, h);
          if (!extensions) continue;
          const pl = { x, y, heading: h, extensions };
          const p = this.ev.prepared(pl);
          if (!p) continue;
          const ceiling = this.ev.ceiling(p);
          if (ceiling > -Infinity) candidates.push({ pl, order: candidates.length, ceiling, p });
        }
      }
      progress((0.5 * (i + 1)) / (nx + 1));
    }
    // Falling ceiling; a ceiling that is not a number cannot rule anything out, so it goes first.
    const key = (c: (typeof candidates)[number]) => (Number.isNaN(c.ceiling) ? Infinity : c.ceiling);
    const byCeiling = [...candidates].sort((a, b) => key(b) - key(a) || a.order - b.order);
    const scored: (Scored & { order: number })[] = [];
    const ranked = () => [...scored].sort((a, b) => b.score - a.score || a.order - b.order);
    for (let k = 0; k < byCeiling.length; k++) {
      if (k > 0 && k % 16 === 0) {
        const top = distinct(ranked(), keep.n, keep.metres, keep.degrees);
        if (top.length === keep.n && key(byCeiling[k]) < top[top.length - 1].score) {
          this.ev.skippedCount += byCeiling.length - k;
          break;
        }
        progress(0.5 + (0.5 * k) / byCeiling.length);
      }
      this.check();
      const c = byCeiling[k];
      const score = this.ev.coarsePrepared(c.p);
      if (score > -Infinity) scored.push({ pl: c.pl, score, order: c.order });
    }
    progress(1);
    return ranked().map(({ pl, score }) => ({ pl, score }));
  }

  /** Compass search on x, y and heading; the legs follow the pose (longest clear) unless `fixedLegs`. */
  refine(start: Scored, spacing: number, fixedLegs = false, budget = 160): Scored {
    let best = start;
    let dxy = spacing / 2;
    let dh = HEADING_STEP / 2;
    let used = 0;
    const moveTo = (x: number, y: number, h: number): Scored => {
      used++;
      // Only a better score than the best moves the search, so the best is the floor.
      if (!fixedLegs) return this.at(x, y, h, best.score);
      const pl = { ...best.pl, x, y, heading: h };
      const ok = bodyClear(this.ground, this.ev.model, x, y, h, this.ev.legs) && this.ev.legs.every((l, i) => padClear(this.ground, l, pl.extensions[i], x, y, h));
      return { pl, score: ok ? this.score(pl, best.score) : -Infinity };
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
        const score = this.score(pl, best.score);
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
