/**
 * The exact and coarse modes timed per swing (part of npm run bench): the bench input's full turn with 50
 * obstacles, and the same truck on a 120° arc with the five obstacles nearest the hook's path.
 */
import { analyzePrepared } from './analyze';
import { analyzeCoarse, coarseMargins, limitsOf } from './coarse';
import { leastMargin, resultMargins } from './margins';
import { prepareLift } from './prepare';
import type { LiftInputIn } from './schema';

/**
 * Per-call times from batches: wall clock, and this process's CPU time (process.cpuUsage), which other
 * programs on a shared machine disturb less. Medians over the batches, ms.
 */
export function perCall(fn: () => unknown, minMs = 1500): { wall: number; cpu: number } {
  let n = 1;
  for (let t = performance.now(); performance.now() - t < 20; n *= 2) for (let i = 0; i < n; i++) fn();
  const walls: number[] = [];
  const cpus: number[] = [];
  const t0 = performance.now();
  while (performance.now() - t0 < minMs || walls.length < 9) {
    const w = performance.now();
    const c = process.cpuUsage();
    for (let i = 0; i < n; i++) fn();
    const used = process.cpuUsage(c);
    walls.push((performance.now() - w) / n);
    cpus.push((used.user + used.system) / 1000 / n);
  }
  const median = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  return { wall: median(walls), cpu: median(cpus) };
}

export function benchModes(cases: { name: string; input: LiftInputIn }[]): void {
  console.log('exact and coarse modes, time per swing (median; the exact mode samples every 1° and leaves out the weight sensitivity, the coarse samples every 3°)');
  for (const { name, input } of cases) {
    const p = prepareLift(input);
    const ex = perCall(() => analyzePrepared(p, { sensitivity: false }));
    const co = perCall(() => analyzeCoarse(p));
    const e = leastMargin(resultMargins(analyzePrepared(p, { sensitivity: false })));
    const c = leastMargin(coarseMargins(analyzeCoarse(p), limitsOf(p)));
    console.log(`  ${name}`);
    console.log(`    exact  ${ex.wall.toFixed(3)} ms wall, ${ex.cpu.toFixed(3)} ms CPU  (target ≤ 2 ms)    least margin ${e.margin.toFixed(4)} (${e.id})`);
    console.log(`    coarse ${co.wall.toFixed(4)} ms wall, ${co.cpu.toFixed(4)} ms CPU (target ≤ 0.1 ms) least margin ${c.margin.toFixed(4)} (${c.id})`);
    console.log(`    exact / coarse = ${(ex.cpu / co.cpu).toFixed(0)}× (CPU)`);
  }
}
