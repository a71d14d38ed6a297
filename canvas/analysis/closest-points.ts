import type { Polygon, Pt } from '@/lib/scene/geometry/vec';

function closestOnSegment(p: Pt, a: Pt, b: Pt): Pt {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return { x: a.x + t * dx, y: a.y + t * dy };
}

/**
 * The nearest pair of points between two polygon outlines (brute force over vertices and edges; for the
 * handful of clearance marks on screen). For overlapping outlines it still returns the nearest edges.
 */
export function closestPoints(a: Polygon, b: Polygon): [Pt, Pt] {
  let best = Infinity;
  let pair: [Pt, Pt] = [a[0], b[0]];
  const scan = (from: Polygon, to: Polygon, flip: boolean) => {
    for (const p of from) {
      for (let i = 0; i < to.length; i++) {
        const q = closestOnSegment(p, to[i], to[(i + 1) % to.length]);
        const d = Math.hypot(p.x - q.x, p.y - q.y);
        if (d < best) {
          best = d;
          pair = flip ? [q, p] : [p, q];
        }
      }
    }
  };
  scan(a, b, false);
  scan(b, a, true);
  return pair;
}
