/**
 * One-dimensional searches used by the swing sweeps. Golden-section search (Kiefer, 1953) refines a
 * bracketed extremum; the Lipschitz walk (after Piyavskii, 1972) finds a global minimum of a function
 * whose slope is bounded, skipping ahead wherever the value is too far above the best found to dip below it.
 */
const INV_PHI = (Math.sqrt(5) - 1) / 2;

export interface Extremum {
  t: number;
  v: number;
}

/** Maximum of f on [a, b], assuming one peak inside; stops when the bracket is narrower than tol. */
export function goldenMax(f: (t: number) => number, a: number, b: number, tol: number): Extremum {
  let x1 = b - INV_PHI * (b - a);
  let x2 = a + INV_PHI * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  while (b - a > tol) {
    if (f1 >= f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - INV_PHI * (b - a);
      f1 = f(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + INV_PHI * (b - a);
      f2 = f(x2);
    }
  }
  return f1 >= f2 ? { t: x1, v: f1 } : { t: x2, v: f2 };
}

export function goldenMin(f: (t: number) => number, a: number, b: number, tol: number): Extremum {
  const r = goldenMax((t) => -f(t), a, b, tol);
  return { t: r.t, v: -r.v };
}

/**
 * Global minimum of f over [0, span] when |f(t) − f(s)| ≤ lipschitz·|t − s|. The result is within
 * tolAbs + tolRel·min of the true minimum; a value of 0 (touching) ends the walk at its first angle.
 */
export function lipschitzMin(
  f: (t: number) => number,
  span: number,
  lipschitz: number,
  opts: { tolAbs: number; tolRel: number; minStep: number; coarseStep: number },
): Extremum {
  let best = Infinity;
  let bestT = 0;
  // A coarse pass gives a good upper bound first, so the walk can take long strides.
  for (let t = 0; t <= span; t += opts.coarseStep) {
    const v = f(t);
    if (v < best) {
      best = v;
      bestT = t;
    }
  }
  const vEnd = f(span);
  if (vEnd < best) {
    best = vEnd;
    bestT = span;
  }
  const L = Math.max(lipschitz, 1e-12);
  let t = 0;
  let stepAtBest = opts.minStep;
  for (;;) {
    const v = f(t);
    if (v < best || (v === best && t < bestT)) {
      best = v;
      bestT = t;
    }
    // Touching: the walk meets overlaps in arc order, so this is the first slew of overlap.
    if (v <= 0) return { t, v: 0 };
    if (t >= span) break;
    const step = Math.max(opts.minStep, (v - best + opts.tolAbs + opts.tolRel * best) / L);
    if (t === bestT) stepAtBest = step;
    t = Math.min(span, t + step);
  }
  const lo = Math.max(0, bestT - stepAtBest);
  const hi = Math.min(span, bestT + stepAtBest);
  if (hi - lo > opts.minStep) {
    const r = goldenMin(f, lo, hi, opts.minStep);
    if (r.v < best) return r;
  }
  return { t: bestT, v: best };
}
