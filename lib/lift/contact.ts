import { convexHull } from './support-polygon';

/**
 * Exact support reactions on a rigid base whose supports push but never pull. The reactions are the
 * unique solution of: minimise ΣR² subject to R ≥ 0, ΣR = W, ΣR·x = Mx, ΣR·y = My (strictly convex, so
 * one answer). Its optimality conditions say R_i = max(0, a + b·x_i + c·y_i): a plane of equal-stiffness
 * supports under a rigid frame (H. Shapiro, Cranes and Derricks, 4th ed., §5: the four-float formula and
 * the release of a float in tension are this plane on four and on three supports).
 *
 * The contact set is found by a Newton iteration on it: solve the plane on the supports in contact, then
 * take as the next set every support the plane presses on, so a support released early comes back into
 * contact when the plane reaches it again. The answer is checked against the optimality conditions; if the
 * iteration does not settle, every contact set of three or more supports is tried. When the combined CG
 * lies on or outside the support polygon no contact set balances the moments: the truck tips, and the
 * reactions reported are the limit state, the whole weight on the two supports at the ends of the line it
 * tips about, split by the lever rule (vertical equilibrium holds; the tipping moment is what is left).
 */
interface Edge {
  i: number;
  j: number;
  nx: number;
  ny: number;
  c: number;
}

interface Model {
  xs: Float64Array;
  ys: Float64Array;
  edges: Edge[];
  /** Largest coordinate magnitude, m: the scale of the tolerances. */
  scale: number;
  /**
   * The sums of fitPlane per contact set, filled as they are first needed (layouts of up to FIT_CACHE
   * supports): FIT fields per mask. They depend only on the layout, and a search solves one layout
   * thousands of times.
   */
  fits: Float64Array | null;
}

const FIT_CACHE = 10;
/** Fields per contact set in Model.fits: known (0 not yet, 1 fits, 2 on one line), count, x̄, ȳ, suu, suv, svv, det. */
const FIT = 8;

const models = new WeakMap<Float64Array, Model>();
function same(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** Recently used models, matched by their coordinates (a search prepares the same layout many times over). */
const recent: Model[] = [];
const RECENT = 16;

function modelOf(xs: Float64Array, ys: Float64Array): Model {
  for (let k = 0; k < recent.length; k++) {
    const m = recent[k];
    if (same(m.xs, xs) && same(m.ys, ys)) {
      if (k > 0) {
        recent.splice(k, 1);
        recent.unshift(m);
      }
      return m;
    }
  }
  const m = modelFor(xs, ys);
  recent.unshift(m);
  if (recent.length > RECENT) recent.pop();
  return m;
}

function modelFor(xs: Float64Array, ys: Float64Array): Model {
  const hit = models.get(xs);
  if (hit && same(hit.xs, xs) && same(hit.ys, ys)) return hit;
  const pts = Array.from(xs, (x, i) => ({ id: String(i), x, y: ys[i] }));
  const hull = convexHull(pts);
  const edges = hull.map((a, k) => {
    const b = hull[(k + 1) % hull.length];
    const len = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    const nx = (b.y - a.y) / len;
    const ny = -(b.x - a.x) / len;
    return { i: Number(a.id), j: Number(b.id), nx, ny, c: nx * a.x + ny * a.y };
  });
  let scale = 1;
  for (let i = 0; i < xs.length; i++) scale = Math.max(scale, Math.abs(xs[i]), Math.abs(ys[i]));
  const fits = xs.length <= FIT_CACHE ? new Float64Array(2 ** xs.length * FIT) : null;
  const m = { xs: Float64Array.from(xs), ys: Float64Array.from(ys), edges, scale, fits };
  models.set(xs, m);
  return m;
}

/** fitPlane's sums for the supports in `mask`, into fitSums: false when fewer than three or on one line. */
const fitSums = { n: 0, mx: 0, my: 0, suu: 0, suv: 0, svv: 0, det: 0 };
function sumsOf(xs: Float64Array, ys: Float64Array, mask: number): boolean {
  let n = 0, sx = 0, sy = 0;
  for (let i = 0; i < xs.length; i++) {
    if (!(mask & (1 << i))) continue;
    n++; sx += xs[i]; sy += ys[i];
  }
  if (n < 3) return false;
  const mx = sx / n, my = sy / n;
  let suu = 0, suv = 0, svv = 0;
  for (let i = 0; i < xs.length; i++) {
    if (!(mask & (1 << i))) continue;
    const u = xs[i] - mx, v = ys[i] - my;
    suu += u * u; suv += u * v; svv += v * v;
  }
  const det = suu * svv - suv * suv;
  if (!(det > 1e-12 * (suu + svv) * (suu + svv))) return false;
  fitSums.n = n; fitSums.mx = mx; fitSums.my = my; fitSums.suu = suu; fitSums.suv = suv; fitSums.svv = svv; fitSums.det = det;
  return true;
}

/** The plane a + b·(x − x̄) + c·(y − ȳ) fitted on the supports in `mask`; false when they lie on one line. */
const plane = { a: 0, b: 0, c: 0, mx: 0, my: 0 };
function fitPlane(m: Model, mask: number, W: number, Mx: number, My: number): boolean {
  const f = m.fits;
  let n: number, mx: number, my: number, suu: number, suv: number, svv: number, det: number;
  if (f) {
    const o = mask * FIT;
    if (f[o] === 0) {
      const ok = sumsOf(m.xs, m.ys, mask);
      f[o] = ok ? 1 : 2;
      if (ok) {
        f[o + 1] = fitSums.n; f[o + 2] = fitSums.mx; f[o + 3] = fitSums.my;
        f[o + 4] = fitSums.suu; f[o + 5] = fitSums.suv; f[o + 6] = fitSums.svv; f[o + 7] = fitSums.det;
      }
    }
    if (f[o] === 2) return false;
    n = f[o + 1]; mx = f[o + 2]; my = f[o + 3]; suu = f[o + 4]; suv = f[o + 5]; svv = f[o + 6]; det = f[o + 7];
  } else {
    if (!sumsOf(m.xs, m.ys, mask)) return false;
    ({ n, mx, my, suu, suv, svv, det } = fitSums);
  }
  // Centred normal equations: a = W/n, and a 2×2 system for the slopes.
  const px = Mx - W * mx, py = My - W * my;
  plane.a = W / n;
  plane.b = (svv * px - suv * py) / det;
  plane.c = (suu * py - suv * px) / det;
  plane.mx = mx;
  plane.my = my;
  return true;
}

const pressOf = (x: number, y: number) => plane.a + plane.b * (x - plane.mx) + plane.c * (y - plane.my);

/** True when the fitted plane on `mask` meets the optimality conditions (within tol, kg). */
function satisfies(xs: Float64Array, ys: Float64Array, mask: number, tol: number): boolean {
  for (let i = 0; i < xs.length; i++) {
    const w = pressOf(xs[i], ys[i]);
    if (mask & (1 << i) ? w < -tol : w > tol) return false;
  }
  return true;
}

export interface ContactSolution {
  mass: Float64Array;
  active: Uint8Array;
  tips: boolean;
}

function write(xs: Float64Array, ys: Float64Array, mask: number, out: ContactSolution): void {
  for (let i = 0; i < xs.length; i++) {
    const on = (mask & (1 << i)) !== 0;
    const r = on ? Math.max(0, pressOf(xs[i], ys[i])) : 0;
    out.mass[i] = r;
    out.active[i] = on && r > 0 ? 1 : 0;
  }
}

/** Contact sets tried by the current solve; at most 4n + 8 ≤ 72 of them (n ≤ 16). */
const seen = new Int32Array(72);
function wasTried(mask: number, count: number): boolean {
  for (let i = 0; i < count; i++) if (seen[i] === mask) return true;
  return false;
}

/** Solves for weight W (kg) with first moments Mx, My (kg·m) about the axis; writes into `out`. */
export function solveContact(xs: Float64Array, ys: Float64Array, W: number, Mx: number, My: number, out: ContactSolution): ContactSolution {
  const n = xs.length;
  out.tips = false;
  // Every way out below writes every support's reaction (write, limitState); only this one needs the zeros.
  if (!(W > 0)) {
    out.mass.fill(0);
    out.active.fill(0);
    return out;
  }
  const model = modelOf(xs, ys);
  const { edges, scale } = model;
  const cx = Mx / W, cy = My / W;
  let worst = edges[0];
  let outside = -Infinity;
  for (const e of edges) {
    const d = e.nx * cx + e.ny * cy - e.c;
    if (d > outside) {
      outside = d;
      worst = e;
    }
  }
  if (outside >= -1e-12 * scale) {
    limitState(xs, ys, worst, W, cx, cy, out);
    out.tips = outside > 1e-9 * scale;
    return out;
  }
  const tol = 1e-9 * W;
  // Contact sets as bit masks: the schema allows at most 16 supports.
  const all = 2 ** n - 1;
  let mask = all;
  // Contact sets tried so far (a plain list: a Set per call cost more than the solve on four supports).
  let tried = 0;
  for (let k = 0; k < 4 * n + 8 && !wasTried(mask, tried); k++) {
    seen[tried++] = mask;
    if (!fitPlane(model, mask, W, Mx, My)) break;
    let next = 0;
    for (let i = 0; i < n; i++) if (pressOf(xs[i], ys[i]) > 0) next |= 1 << i;
    if (next === mask || satisfies(xs, ys, mask, tol)) {
      write(xs, ys, mask, out);
      return out;
    }
    mask = next;
  }
  // The iteration did not settle: try every contact set, keeping the one that meets the conditions best.
  let best = -1;
  let bestViolation = Infinity;
  for (let m = 1; m <= all; m++) {
    if (!fitPlane(model, m, W, Mx, My)) continue;
    let violation = 0;
    for (let i = 0; i < n; i++) {
      const w = pressOf(xs[i], ys[i]);
      violation = Math.max(violation, m & (1 << i) ? -w : w);
    }
    if (violation < bestViolation) {
      bestViolation = violation;
      best = m;
    }
  }
  if (best >= 0 && fitPlane(model, best, W, Mx, My)) write(xs, ys, best, out);
  else limitState(xs, ys, worst, W, cx, cy, out);
  return out;
}

function limitState(xs: Float64Array, ys: Float64Array, e: Edge, W: number, cx: number, cy: number, out: ContactSolution): void {
  const ax = xs[e.i], ay = ys[e.i], bx = xs[e.j], by = ys[e.j];
  const len2 = (bx - ax) ** 2 + (by - ay) ** 2;
  const t = Math.min(1, Math.max(0, ((cx - ax) * (bx - ax) + (cy - ay) * (by - ay)) / len2));
  out.mass.fill(0);
  out.active.fill(0);
  out.mass[e.i] = W * (1 - t);
  out.mass[e.j] += W * t;
  out.active[e.i] = out.mass[e.i] > 0 ? 1 : 0;
  out.active[e.j] = out.mass[e.j] > 0 ? 1 : 0;
}
