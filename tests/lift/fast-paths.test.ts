import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  boomAxisGap, boomAxisToPrism, boomClearanceAt, boomClearanceOver, boomMeets, clearanceAt, clearanceOver, gapAt, lipschitzMin,
  placeOutline, pointPolygonDistance, pointSegmentDist2, polygonGap, prepareLift, slewAt, normalizeDegrees,
  type LiftInputIn, type PreparedLift, type Target,
} from '@/lib/lift';
import { rotator } from './scenarios';

/**
 * The boom walk's faster kernel against the plain one, which stays in the engine as the reference
 * (boomAxisToPrism), and the load and boom walks against the plain walks written out here as they were
 * before the speed work. The faster code must give the same numbers exactly (===), not close ones: the
 * golden fixtures hold the engine's figures to 1e-9, and each walk's next angle depends on every gap it
 * has read, so a different last bit moves the angles it reports.
 */

const coord = fc.oneof(
  fc.double({ min: -20, max: 20, noNaN: true }),
  // Whole and half metres: exactly collinear, touching and shared edges and vertices.
  fc.integer({ min: -8, max: 8 }).map((v) => v / 2),
);
const point = fc.record({ x: coord, y: coord });

/** A target as prepareLift makes it, from a polygon and a top. */
function targetOf(points: { x: number; y: number }[], top: number): Target {
  const p = prepareLift(rotator({ bodies: [], obstacles: [{ id: 'o', polygon: points, top }] }));
  return p.targets[0];
}

describe('boomAxisGap', () => {
  const z = fc.oneof(fc.double({ min: 0, max: 12, noNaN: true }), fc.integer({ min: 0, max: 8 }).map((v) => v / 2));
  it('gives exactly what boomAxisToPrism gives (rising, falling and level booms, through, over and beside the part)', () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.array(fc.record({ x: fc.double({ min: -6, max: 6, noNaN: true }), y: fc.double({ min: -6, max: 6, noNaN: true }) }), { minLength: 3, maxLength: 6 }),
          // Boxes on whole and half metres (edges level with the boom's ends, shared coordinates).
          fc.tuple(coord, coord, fc.integer({ min: 1, max: 8 }), fc.integer({ min: 1, max: 8 }))
            .map(([x, y, w, h]) => [{ x, y }, { x: x + w / 2, y }, { x: x + w / 2, y: y + h / 2 }, { x, y: y + h / 2 }]),
        ),
        z, point, z, point, z, fc.boolean(),
        (ring, top, p, pz, q, qz, level) => {
          let t: Target;
          try {
            t = targetOf(ring, top);
          } catch {
            return; // prepareLift refuses a degenerate outline (zero area): not a target.
          }
          const qz2 = level ? pz : qz;
          expect(boomAxisGap(p.x, p.y, pz, q.x, q.y, qz2, t)).toBe(boomAxisToPrism(p.x, p.y, pz, q.x, q.y, qz2, t));
          expect(boomAxisGap(q.x, q.y, qz2, p.x, p.y, pz, t)).toBe(boomAxisToPrism(q.x, q.y, qz2, p.x, p.y, pz, t));
        },
      ),
      { numRuns: 3000 },
    );
  });
});

/* ---- The walks as they were before the speed work (lib/lift/clearance.ts, boom-clearance.ts), verbatim but for the kernels' names. ---- */

const WALK = { tolAbs: 0.002, tolRel: 0.002, minStep: 0.005, coarseStep: 15 };
const refBuf = new Float64Array(64);

function refGapCS(p: PreparedLift, target: Target, c: number, s: number): number {
  const hx = c * p.hookX0 - s * p.hookY0;
  const hy = s * p.hookX0 + c * p.hookY0;
  const fp = p.footprint;
  if (fp.kind === 'circle') return Math.max(0, pointPolygonDistance(hx, hy, target.poly, target.n) - fp.radius);
  placeOutline(fp.local, fp.n, c, s, hx, hy, refBuf);
  return polygonGap(refBuf, fp.n, target.poly, target.n);
}

const refSlewAt = (p: PreparedLift, t: number) => normalizeDegrees(p.from + p.sign * t);

function refClearanceSlew(p: PreparedLift, target: Target): number {
  const lipschitz = ((p.radius + p.footprint.reach) * Math.PI) / 180;
  let best = Infinity;
  const gap = (t: number) => {
    const a = (refSlewAt(p, t) * Math.PI) / 180, c = Math.cos(a), s = Math.sin(a);
    const hx = c * p.hookX0 - s * p.hookY0;
    const hy = s * p.hookX0 + c * p.hookY0;
    const rough = Math.hypot(hx - target.cx, hy - target.cy) - target.r - p.footprint.reach;
    if (rough > best * (1 + WALK.tolRel) + 4 * WALK.tolAbs) return rough;
    const g = refGapCS(p, target, c, s);
    if (g < best) best = g;
    return g;
  };
  return refSlewAt(p, lipschitzMin(gap, p.span, lipschitz, WALK).t);
}

function refBoomSlew(p: PreparedLift, t: Target): number {
  const lipschitz = (Math.max(p.radius, Math.hypot(p.pivotX0, p.pivotY0)) * Math.PI) / 180;
  let best = Infinity;
  const gap = (u: number) => {
    const a = (refSlewAt(p, u) * Math.PI) / 180, c = Math.cos(a), s = Math.sin(a);
    const px = c * p.pivotX0 - s * p.pivotY0, py = s * p.pivotX0 + c * p.pivotY0;
    const qx = c * p.hookX0 - s * p.hookY0, qy = s * p.hookX0 + c * p.hookY0;
    const plan = Math.sqrt(pointSegmentDist2(t.cx, t.cy, px, py, qx, qy)) - t.r;
    const rough = Math.max(plan, Math.min(p.pivotZ, p.tipZ) - t.top) - p.boomRadius;
    if (rough > best * (1 + WALK.tolRel) + 4 * WALK.tolAbs) return rough;
    const g = Math.max(0, boomAxisToPrism(px, py, p.pivotZ, qx, qy, p.tipZ, t) - p.boomRadius);
    if (g < best) best = g;
    return g;
  };
  return refSlewAt(p, lipschitzMin(gap, p.span, lipschitz, WALK).t);
}

/* ---- Random scenes (invented values): obstacles in and about the hook's path, some taller than the boom's pivot. ---- */

const obstacle = fc.record({
  r: fc.double({ min: 1, max: 16, noNaN: true }),
  a: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
  hw: fc.double({ min: 0.1, max: 2.5, noNaN: true }),
  hd: fc.double({ min: 0.1, max: 2.5, noNaN: true }),
  top: fc.double({ min: 0.2, max: 10, noNaN: true }),
  notch: fc.boolean(),
});

const footprint = fc.oneof(
  fc.record({ kind: fc.constant('rect' as const), length: fc.double({ min: 0.5, max: 6, noNaN: true }), width: fc.double({ min: 0.5, max: 3, noNaN: true }) }),
  fc.record({ kind: fc.constant('circle' as const), diameter: fc.double({ min: 0.3, max: 3, noNaN: true }) }),
  fc.constant<LiftInputIn['load']['footprint']>({ kind: 'polygon', points: [{ x: -1, y: -1 }, { x: 1.2, y: -1 }, { x: 1.2, y: 0.2 }, { x: 0, y: 0.2 }, { x: 0, y: 1 }, { x: -1, y: 1 }] }),
);

const scene = fc
  .record({
    length: fc.double({ min: 4, max: 14, noNaN: true }),
    elevation: fc.oneof(fc.double({ min: -10, max: 75, noNaN: true }), fc.constant(0)),
    hang: fc.double({ min: 0.5, max: 8, noNaN: true }),
    footprint,
    from: fc.double({ min: 0, max: 360, noNaN: true }),
    span: fc.oneof(fc.double({ min: 0, max: 360, noNaN: true }), fc.constant(360)),
    cw: fc.boolean(),
    obstacles: fc.array(obstacle, { minLength: 1, maxLength: 6 }),
  })
  .map((s): LiftInputIn => rotator({
    boom: { ...rotator().boom, length: s.length, elevation: s.elevation },
    load: { mass: 3000, footprint: s.footprint, height: 1.5, hang: s.hang },
    swing: { from: s.from, to: s.from + (s.cw ? -s.span : s.span), direction: s.cw ? 'cw' : 'ccw' },
    obstacles: s.obstacles.map((o, i) => {
      const cx = o.r * Math.cos(o.a), cy = o.r * Math.sin(o.a);
      // An L-shaped outline (not convex) for some.
      const polygon = o.notch
        ? [{ x: cx - o.hw, y: cy - o.hd }, { x: cx + o.hw, y: cy - o.hd }, { x: cx + o.hw, y: cy }, { x: cx, y: cy }, { x: cx, y: cy + o.hd }, { x: cx - o.hw, y: cy + o.hd }]
        : [{ x: cx - o.hw, y: cy - o.hd }, { x: cx + o.hw, y: cy - o.hd }, { x: cx + o.hw, y: cy + o.hd }, { x: cx - o.hw, y: cy + o.hd }];
      return { id: `o${i}`, polygon, top: o.top };
    }),
  }));

describe('the clearance walks with the faster kernels', () => {
  it('report exactly the figures and angles of the plain walks, for the load and the boom (random scenes)', () => {
    fc.assert(
      fc.property(scene, (input) => {
        const p = prepareLift(input);
        for (const t of p.targets) {
          const slew = refClearanceSlew(p, t);
          const c = clearanceOver(p, t);
          expect(c.slew).toBe(slew);
          expect(c.horizontal).toBe(refGapCS(p, t, Math.cos((slew * Math.PI) / 180), Math.sin((slew * Math.PI) / 180)));
          expect(c).toEqual(clearanceAt(p, t, slew));
          expect(gapAt(p, t, slew)).toBe(c.horizontal);
          if (!boomMeets(t)) continue;
          const boomSlew = refBoomSlew(p, t);
          const b = boomClearanceOver(p, t);
          expect(b.slew).toBe(boomSlew);
          // boomClearanceAt works the figures and where on the boom they fall out with boomAxisToPrism.
          expect(b).toEqual(boomClearanceAt(p, t, boomSlew));
        }
      }),
      { numRuns: 300 },
    );
  });

  it('slewAt gives what normalizeDegrees gives on every arc position, the ends and the wrap included', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 360, noNaN: true }), fc.oneof(fc.double({ min: 0, max: 360, noNaN: true }), fc.constantFrom(0, 360, 1e-300)), fc.boolean(), (from, t, cw) => {
        const p = prepareLift(rotator({ swing: { from, to: from + (cw ? -90 : 90), direction: cw ? 'cw' : 'ccw' } }));
        expect(Object.is(slewAt(p, t), refSlewAt(p, t))).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });
});
