/**
 * A root of a continuous function inside a bracket [a, b] with f(a) < 0 ≤ f(b): regula falsi with the
 * Illinois modification (Dowell & Jarratt, 1971), which keeps the bracket and converges superlinearly;
 * each new point is kept at least tol/2 inside the bracket so that the bracket itself shrinks below tol.
 * For a function that is affine on the bracket it lands on the root at the first step.
 */
export interface Root {
  /** Midpoint of the final bracket. */
  x: number;
  /** The final bracket: f(lo) < 0 ≤ f(hi), hi − lo ≤ tol (unless maxIter ran out). */
  lo: number;
  hi: number;
  iterations: number;
}

export function bracketedRoot(f: (x: number) => number, a: number, b: number, fa: number, fb: number, tol: number, maxIter = 100): Root {
  let side = 0;
  let k = 0;
  for (; k < maxIter && b - a > tol; k++) {
    let c = (a * fb - b * fa) / (fb - fa);
    if (!Number.isFinite(c)) c = (a + b) / 2;
    c = Math.min(b - tol / 2, Math.max(a + tol / 2, c));
    const fc = f(c);
    if (fc >= 0) {
      b = c;
      fb = fc;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return { x: (a + b) / 2, lo: a, hi: b, iterations: k };
}
