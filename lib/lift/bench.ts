/**
 * npm run bench — not a test. A full 360° swing (exact worst case plus a 0.1° sweep) with 4 supports,
 * 50 obstacles and 2 power lines; prints the median and p95 of the whole analysis, and the ratio against
 * a straightforward version that calls turf at every 0.1° for the clearances, measured in the same run.
 */
import * as turf from '@turf/turf';
import { analyzeLift } from './analyze';
import type { Clearance } from './clearance';
import { parseLiftInput, prepareLift, slewAt } from './prepare';
import type { LiftInputIn } from './schema';
import { benchModes } from './bench-modes';

/** Deterministic pseudo-random numbers (a 32-bit LCG, Numerical Recipes constants). */
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
}

export function benchInput(): LiftInputIn {
  const rnd = lcg(7);
  const obstacles = Array.from({ length: 50 }, (_, i) => {
    const r = 5 + rnd() * 15;
    const a = rnd() * 2 * Math.PI;
    const cx = r * Math.cos(a), cy = r * Math.sin(a), hw = 0.5 + rnd(), hd = 0.5 + rnd() * 1.5;
    return {
      id: `obstacle ${i + 1}`,
      polygon: [{ x: cx - hw, y: cy - hd }, { x: cx + hw, y: cy - hd }, { x: cx + hw, y: cy + hd }, { x: cx - hw, y: cy + hd }],
      top: 0.5 + rnd() * 4,
    };
  });
  return {
    supports: [
      { id: 'FL', x: 2.3, y: 2.5, area: 0.36, cribbingArea: 1.44, cribbingMass: 140 },
      { id: 'RL', x: -3.6, y: 2.5, area: 0.36, cribbingArea: 1.44, cribbingMass: 140 },
      { id: 'RR', x: -3.6, y: -2.5, area: 0.36, cribbingArea: 1.44, cribbingMass: 140 },
      { id: 'FR', x: 2.3, y: -1.9, area: 0.36, cribbingArea: 1.44, cribbingMass: 140 },
    ],
    masses: [
      { id: 'carrier', mass: 24000, x: 0.8, y: 0, z: 1.2 },
      { id: 'turret', mass: 4500, x: 0, y: 0, z: 2.3, rotates: true },
      { id: 'counterweight', mass: 6000, x: -2, y: 0, z: 2, rotates: true },
    ],
    boom: { pivot: { x: -0.6, y: 0, z: 3 }, length: 9, elevation: 35, mass: 4000, cgFraction: 0.45 },
    hook: { blockMass: 150, riggingMass: 80 },
    load: { mass: 6000, footprint: { kind: 'rect', length: 1.6, width: 1.2 }, height: 1.2, hang: 4 },
    swing: { from: 0, to: 360, direction: 'ccw' },
    obstacles,
    powerLines: [
      { id: 'feeder', a: { x: -30, y: 14, z: 11 }, b: { x: 30, y: 14, z: 11 }, kV: 13.8 },
      { id: 'transmission', a: { x: 25, y: -30, z: 18 }, b: { x: 25, y: 30, z: 18 }, kV: 138 },
    ],
    soil: { allowable: 143.64 },
  };
}

// Local metres to degrees on the equator, so that turf's spherical measures read as metres.
const M_PER_DEG = 111319.49079327357;
const ll = (x: number, y: number) => [x / M_PER_DEG, y / M_PER_DEG];

/** The straightforward version: the engine for the rest, turf at every 0.1° for every obstacle. */
function naiveAnalysis(input: LiftInputIn) {
  const result = analyzeLift({ ...input, obstacles: [], bodies: [] }, { step: 0.1 });
  const p = prepareLift(input);
  const { length, width } = input.load.footprint as { length: number; width: number };
  const polys = p.targets.map((t) => {
    const ring = Array.from({ length: t.n }, (_, i) => ll(t.poly[2 * i], t.poly[2 * i + 1]));
    return turf.polygon([[...ring, ring[0]]]);
  });
  const best = p.targets.map(() => ({ gap: Infinity, slew: 0 }));
  for (let k = 0; k <= Math.round(p.span * 10); k++) {
    const slew = slewAt(p, k / 10);
    const a = (slew * Math.PI) / 180, c = Math.cos(a), s = Math.sin(a);
    const hx = c * p.hookX0, hy = s * p.hookX0;
    const corners = [[-1, -1], [1, -1], [1, 1], [-1, 1]].map(([u, v]) => {
      const lu = (u * length) / 2, lv = (v * width) / 2;
      return ll(hx + c * lu - s * lv, hy + s * lu + c * lv);
    });
    const fp = turf.polygon([[...corners, corners[0]]]);
    const fpLine = turf.polygonToLine(fp) as GeoJSON.Feature<GeoJSON.LineString>;
    polys.forEach((poly, i) => {
      let gap = 0;
      if (!turf.booleanIntersects(fp, poly)) {
        const obLine = turf.polygonToLine(poly) as GeoJSON.Feature<GeoJSON.LineString>;
        gap = Infinity;
        for (const q of corners) gap = Math.min(gap, turf.pointToLineDistance(turf.point(q), obLine, { units: 'meters' }));
        for (const q of poly.geometry.coordinates[0]) gap = Math.min(gap, turf.pointToLineDistance(turf.point(q), fpLine, { units: 'meters' }));
      }
      if (gap < best[i].gap) best[i] = { gap, slew };
    });
  }
  const clearances: Clearance[] = p.targets.map((t, i) => ({
    target: t.id, name: t.name, kind: t.kind, horizontal: best[i].gap, vertical: p.loadBottom - t.top, slew: best[i].slew,
    overlapsInPlan: best[i].gap <= 0, conflict: best[i].gap <= 0 && p.loadBottom < t.top,
  }));
  return { ...result, clearances };
}

function time(fn: () => unknown, runs: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    out.push(performance.now() - t0);
  }
  return out.sort((a, b) => a - b);
}

const pct = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];

/** The bench input on a 120° arc with only the obstacles nearest the hook's path (a typical roadside lift). */
function partialInput(): LiftInputIn {
  const raw = benchInput();
  const near = [...(raw.obstacles ?? [])].sort((a, b) => Math.abs(Math.hypot(a.polygon[0].x, a.polygon[0].y) - 11) - Math.abs(Math.hypot(b.polygon[0].x, b.polygon[0].y) - 11));
  return { ...raw, obstacles: near.slice(0, 5), swing: { from: 200, to: 80, direction: 'cw' } };
}

function main() {
  benchModes([
    { name: '360° swing, 50 obstacles, 2 power lines', input: benchInput() },
    { name: '120° swing, 5 obstacles, 2 power lines', input: partialInput() },
  ]);
  if (process.argv.includes('--modes')) return;
  const raw = benchInput();
  // The editor validates once per edit and then re-analyses; time the analysis of a validated input,
  // and the zod validation on its own.
  const input = parseLiftInput(raw);
  time(() => analyzeLift(input, { step: 0.1 }), 30);
  const fast = time(() => analyzeLift(input, { step: 0.1 }), 300);
  const zod = time(() => parseLiftInput(structuredClone(raw)), 100);
  const naive = time(() => naiveAnalysis(input), 3);
  const fastMed = pct(fast, 0.5);
  const naiveMed = pct(naive, 0.5);
  const a = analyzeLift(input, { step: 0.1 });
  const b = naiveAnalysis(input);
  const worstGapDiff = Math.max(...a.clearances.map((c, i) => Math.abs(c.horizontal - b.clearances[i].horizontal)));
  console.log('lift engine bench: 360° swing, 0.1° sweep, 4 supports, 50 obstacles, 2 power lines');
  console.log(`  engine  median ${fastMed.toFixed(2)} ms   p95 ${pct(fast, 0.95).toFixed(2)} ms   (${fast.length} runs)`);
  console.log(`  zod validation of the raw input (once per edit): median ${pct(zod, 0.5).toFixed(2)} ms`);
  console.log(`  naive   median ${naiveMed.toFixed(1)} ms   p95 ${pct(naive, 0.95).toFixed(1)} ms   (${naive.length} runs, turf per 0.1° for clearance)`);
  console.log(`  ratio   naive / engine = ${(naiveMed / fastMed).toFixed(0)}×`);
  console.log(`  largest difference in a minimum clearance between the two: ${(worstGapDiff * 1000).toFixed(1)} mm`);
  console.log(`  worst case ${a.worstCase.percentOfTipping.toFixed(2)} % at ${a.worstCase.slew.toFixed(2)}° about ${a.worstCase.line}`);
}

if (process.argv[1]?.endsWith("bench.ts")) main();
