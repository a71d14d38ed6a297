import { hookSitePoint } from '@/lib/scene/geometry/truck';
import type { Pt } from '@/lib/scene/geometry/vec';
import type { LoadObject, TruckObject } from '@/lib/scene/objects';
import { Evaluator, figuresOf } from './evaluate';
import { bodyClear, groundOf, padClear } from './ground';
import { distinct, Search, type Scored } from './search';
import { AdvisorInputError, type AdvisorOptions, type AdvisorResult, type AdvisorSite, type Placement, type Proposal } from './types';

/** How many placements the advisor proposes, and how many it confirms with the exact analysis. */
export const PROPOSALS = 3;
const CONFIRM = 6;
/** Grid points wanted over the search box (the spacing follows from it, 0.5–3 m). */
const GRID_POINTS = 400;

const DEG = Math.PI / 180;

function defaults(site: AdvisorSite): { pick: Pt; set: Pt } {
  const doc = site.document;
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  const load = doc.objects.find((o): o is LoadObject => o.kind === 'load');
  if (!truck || !load) throw new AdvisorInputError('The scene needs a truck and a load before a placement can be searched for.');
  return { pick: site.pick ?? { x: load.x, y: load.y }, set: site.set ?? hookSitePoint(truck, site.model, doc.swing.to) };
}

/** Searches truck position, heading and leg extensions for the placements with the best least margin. */
export function advise(site: AdvisorSite, options: AdvisorOptions = {}): AdvisorResult {
  const t0 = performance.now();
  const { pick, set } = defaults(site);
  const ev = new Evaluator(site.document, site.model, pick, set);
  const ground = groundOf(site.document, site.usableArea !== undefined ? site.usableArea : (site.document.usableArea ?? null));
  const b = site.model.boom;
  const reach = {
    min: b.pivot.x + b.minLength * Math.cos(b.maxElevation * DEG),
    max: b.pivot.x + b.maxLength * Math.cos(Math.max(b.minElevation, 0) * DEG),
  };
  const search = new Search(ev, ground, reach, options);
  const progress = options.onProgress ?? (() => {});

  // 1. Grid over the box where both points are in reach (and the usable area, when marked).
  let box = {
    minX: Math.max(pick.x, set.x) - reach.max, maxX: Math.min(pick.x, set.x) + reach.max,
    minY: Math.max(pick.y, set.y) - reach.max, maxY: Math.min(pick.y, set.y) + reach.max,
  };
  if (ground.area) {
    const xs = ground.area.poly.map((p) => p.x), ys = ground.area.poly.map((p) => p.y);
    box = { minX: Math.max(box.minX, Math.min(...xs)), maxX: Math.min(box.maxX, Math.max(...xs)), minY: Math.max(box.minY, Math.min(...ys)), maxY: Math.min(box.maxY, Math.max(...ys)) };
  }
  const area = Math.max(0, box.maxX - box.minX) * Math.max(0, box.maxY - box.minY);
  const spacing = Math.min(3, Math.max(0.5, Math.sqrt(area / GRID_POINTS)));
  const keep = { n: 6, metres: 2 * spacing, degrees: 2 * 15 };
  const grid = area > 0 ? search.grid(box, spacing, keep, (f) => progress({ phase: 'grid', fraction: 0.5 * f })) : [];

  // 2. Compass search from the best distinct grid points and from the scene's own placement.
  const start = ev.startPlacement();
  const startStands = bodyClear(ground, site.model, start.x, start.y, start.heading, ev.legs) && ev.legs.every((l, i) => padClear(ground, l, start.extensions[i], start.x, start.y, start.heading));
  const seeds: Scored[] = distinct(grid, keep.n, keep.metres, keep.degrees);
  if (startStands) seeds.push({ pl: start, score: search.score(start) });
  const refined: Scored[] = [];
  seeds.forEach((s, i) => {
    if (s.score > -Infinity) refined.push(search.refine(s, spacing, s.pl === start));
    progress({ phase: 'refine', fraction: 0.5 + (0.25 * (i + 1)) / seeds.length });
  });

  // 3. Every combination of leg stages for the best few, then a last compass search with those legs.
  const best = distinct([...refined].sort((a, b) => b.score - a.score), CONFIRM, 0.5, 5);
  const withLegs = best.map((s, i) => {
    const l = search.bestLegs(s);
    progress({ phase: 'legs', fraction: 0.75 + (0.15 * (i + 1)) / best.length });
    return l === s ? s : search.refine(l, spacing / 4, true, 60);
  });

  // 4. Confirm with the exact analysis, the scene's own placement among them; rank by the exact least margin.
  const startExact = ev.exact(site.document);
  const pool: { pl: Placement | null; current: boolean }[] = withLegs.map((s) => ({ pl: s.pl, current: false }));
  if (startStands) pool.push({ pl: null, current: true });
  const confirmed = pool.flatMap(({ pl, current }, i) => {
    const document = pl ? ev.documentFor(pl) : site.document;
    const exact = pl ? ev.exact(document) : startExact;
    progress({ phase: 'confirm', fraction: 0.9 + (0.1 * (i + 1)) / pool.length });
    return exact ? [{ pl: pl ?? start, current, document, exact }] : [];
  });
  confirmed.sort((a, b) => b.exact.least.margin - a.exact.least.margin);
  const chosen = distinct(confirmed.map((c) => ({ pl: c.pl, score: c.exact.least.margin, c })), PROPOSALS, 0.5, 5) as (Scored & { c: (typeof confirmed)[number] })[];
  const proposals: Proposal[] = chosen.map(({ c }, i) => {
    const truck = c.document.objects.find((o): o is TruckObject => o.kind === 'truck')!;
    return {
      rank: i + 1,
      current: c.current,
      truck: { x: truck.x, y: truck.y, heading: truck.rotation },
      legs: ev.legs.map((l) => {
        const e = truck.legs[l.id]?.extension ?? 0;
        const near = (v: number | null) => v !== null && Math.abs(e - (v - l.retracted)) < 1e-6;
        return { id: l.id, extension: e, stage: near(l.full) ? 'full' : near(l.intermediate) ? 'intermediate' : near(l.retracted) ? 'retracted' : 'as set' };
      }),
      boom: { length: truck.boom.length, elevation: truck.boom.elevation },
      swing: c.document.swing,
      leastMargin: c.exact.least,
      figures: figuresOf(c.exact.result, c.document),
      document: c.document,
    };
  });
  return {
    pick, set,
    start: startExact ? { leastMargin: startExact.least, figures: figuresOf(startExact.result, site.document) } : null,
    proposals,
    evaluations: { coarse: ev.coarseCount, exact: ev.exactCount, skipped: ev.skippedCount },
    elapsedMs: performance.now() - t0,
  };
}
