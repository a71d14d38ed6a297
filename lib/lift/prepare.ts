import { assertMass, LiftError } from './errors';
import { validateLoadChart } from './load-chart';
import { BOOM_WIDTH, type LiftInput, type LiftInputIn, type PowerLine } from './schema';
import { checkPolygon, parseLiftInput, siteObjects } from './validate';
import { supportPolygon, type SupportPoint, type TippingLineGeom } from './support-polygon';
import { footprintLocal, type FootprintLocal } from './footprint';

import { arcOf } from './swing';
import { padName } from './names';
import { normalizeDegrees } from './types';

export { parseLiftInput } from './validate';
export { arcOf } from './swing';

/** A body part or obstacle as the clearance sweep sees it: a flat polygon in the truck frame. */
export interface Target {
  id: string;
  /** What results call it (the input's name, else its id). */
  name: string;
  kind: 'body' | 'obstacle';
  poly: Float64Array;
  n: number;
  top: number;
  /** Bounding circle (centre of the vertices' box, radius), for a cheap lower bound on gaps. */
  cx: number;
  cy: number;
  r: number;
  /** The vertices' box: least and greatest x and y. */
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/** Everything the per-angle evaluations need, worked out once per input. */
export interface PreparedLift {
  input: LiftInput;
  hull: SupportPoint[];
  lines: TippingLineGeom[];
  /** Non-rotating masses: total and first moments about the axis (kg, kg·m). */
  fixedMass: number;
  fixedMx: number;
  fixedMy: number;
  /** Masses that turn with the slew, boom included, with first moments at slew 0. */
  rotMass: number;
  rotMx0: number;
  rotMy0: number;
  /** Hook load = load + block + rigging, kg. */
  hookLoad: number;
  hookX0: number;
  hookY0: number;
  /** Radius of the hook from the slew axis, m (constant over the swing). */
  radius: number;
  pivotX0: number;
  pivotY0: number;
  pivotZ: number;
  tipZ: number;
  loadBottom: number;
  loadTop: number;
  footprint: FootprintLocal;
  supportX: Float64Array;
  supportY: Float64Array;
  targets: Target[];
  powerLines: PowerLine[];
  /** Planned arc: slew(t) = from + sign·t for t in [0, span] degrees. */
  from: number;
  span: number;
  sign: 1 | -1;
  /** True when the swing covers every slew (see swing.ts for the rule). */
  fullTurn: boolean;
  /** Half the boom's width, m: the radius of the capsule checked against parts, obstacles and power lines. */
  boomRadius: number;
}


/** Validates the input (typed errors) and precomputes what every slew evaluation shares. */
export function prepareLift(raw: LiftInputIn | LiftInput): PreparedLift {
  const input = parseLiftInput(raw);
  // Messages name things as people do (the input's names, pad names), never by an internal id: they reach the
  // editor's results panel and the plan's "nothing to compute" line as they are. `field` keeps the path.
  input.masses.forEach((m, i) => assertMass(m.mass, `masses.${i}.mass`, `The truck's ${m.id} mass`));
  assertMass(input.boom.mass, 'boom.mass', 'The boom');
  assertMass(input.load.mass, 'load.mass', 'The load');
  assertMass(input.hook.blockMass, 'hook.blockMass', 'The hook block');
  assertMass(input.hook.riggingMass, 'hook.riggingMass', 'The rigging');
  input.supports.forEach((s, i) => assertMass(s.cribbingMass ?? 0, `supports.${i}.cribbingMass`, `The cribbing under the ${s.name ?? padName(s.id, s.x, s.y)} pad`));
  if (!(input.boom.length > 0)) {
    throw new LiftError('zero-length-boom', 'The boom has no length (zero, below zero or not a number); give the length from pivot to tip.', 'boom.length');
  }
  const { hull, lines } = supportPolygon(input.supports);
  if (input.loadChart) validateLoadChart(input.loadChart);

  const fromSite = siteObjects(input);
  const targets: Target[] = [];
  const target = (id: string, name: string | undefined, kind: Target['kind'], poly: Float64Array, top: number): Target => {
    let x0 = Infinity, x1 = -Infinity, y0 = Infinity, y1 = -Infinity;
    for (let i = 0; i < poly.length; i += 2) {
      x0 = Math.min(x0, poly[i]); x1 = Math.max(x1, poly[i]); y0 = Math.min(y0, poly[i + 1]); y1 = Math.max(y1, poly[i + 1]);
    }
    const cx = (x0 + x1) / 2, cy = (y0 + y1) / 2;
    let r = 0;
    for (let i = 0; i < poly.length; i += 2) r = Math.max(r, Math.hypot(poly[i] - cx, poly[i + 1] - cy));
    return { id, name: name ?? id, kind, poly, n: poly.length / 2, top, cx, cy, r, x0, x1, y0, y1 };
  };
  input.bodies.forEach((b, i) => {
    targets.push(target(b.id, b.name, 'body', checkPolygon(b.polygon, `bodies.${i}.polygon`, `The truck's ${b.name ?? b.id}`), b.top));
  });
  [...input.obstacles, ...fromSite.obstacles].forEach((o, i) => {
    const field = i < input.obstacles.length ? `obstacles.${i}.polygon` : `site.obstacles.${i - input.obstacles.length}.polygon`;
    targets.push(target(o.id, o.name, 'obstacle', checkPolygon(o.polygon, field, o.name ? `The obstacle “${o.name}”` : 'An obstacle'), o.top));
  });
  if (input.load.footprint.kind === 'polygon') checkPolygon(input.load.footprint.points, 'load.footprint.points', 'The load footprint');

  let fixedMass = 0, fixedMx = 0, fixedMy = 0, rotMass = 0, rotMx0 = 0, rotMy0 = 0;
  for (const m of input.masses) {
    if (m.rotates) {
      rotMass += m.mass;
      rotMx0 += m.mass * m.x;
      rotMy0 += m.mass * m.y;
    } else {
      fixedMass += m.mass;
      fixedMx += m.mass * m.x;
      fixedMy += m.mass * m.y;
    }
  }
  const { pivot, length, elevation, mass: boomMass, cgFraction } = input.boom;
  const el = (elevation * Math.PI) / 180;
  const reach = length * Math.cos(el);
  rotMass += boomMass;
  rotMx0 += boomMass * (pivot.x + cgFraction * reach);
  rotMy0 += boomMass * pivot.y;
  const hookX0 = pivot.x + reach;
  const hookY0 = pivot.y;
  const tipZ = pivot.z + length * Math.sin(el);
  const loadBottom = tipZ - input.load.hang;
  const { from, span, sign, fullTurn } = arcOf(input.swing);
  return {
    input, hull, lines,
    fixedMass, fixedMx, fixedMy, rotMass, rotMx0, rotMy0,
    hookLoad: input.load.mass + input.hook.blockMass + input.hook.riggingMass,
    hookX0, hookY0, radius: Math.hypot(hookX0, hookY0),
    pivotX0: pivot.x, pivotY0: pivot.y, pivotZ: pivot.z, tipZ,
    loadBottom, loadTop: loadBottom + input.load.height,
    footprint: footprintLocal(input.load.footprint),
    supportX: Float64Array.from(input.supports, (s) => s.x),
    supportY: Float64Array.from(input.supports, (s) => s.y),
    targets,
    powerLines: [...input.powerLines, ...fromSite.powerLines],
    from, span, sign, fullTurn,
    boomRadius: (input.boom.width ?? BOOM_WIDTH) / 2,
  };
}

/** The same prepared lift with another load mass (for the upper-weight case and property tests). */
export function withLoadMass(p: PreparedLift, loadMass: number): PreparedLift {
  assertMass(loadMass, 'load.mass', 'The load');
  const input = { ...p.input, load: { ...p.input.load, mass: loadMass } };
  return { ...p, input, hookLoad: loadMass + input.hook.blockMass + input.hook.riggingMass };
}

/**
 * Slew at `t` degrees along the planned arc, in [0, 360). Between 0 and 360 exclusive normalizeDegrees
 * returns its argument unchanged, so that case skips it (the swing walks call this thousands of times).
 */
export const slewAt = (p: PreparedLift, t: number): number => {
  const d = p.from + p.sign * t;
  return d > 0 && d < 360 ? d : normalizeDegrees(d);
};
