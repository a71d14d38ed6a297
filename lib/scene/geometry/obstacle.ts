import type { ObstacleObject } from '../objects';
import { circlePolygon, placePoint, placePolygon, rectPolygon, type Polygon, type Pt } from './vec';

/** Drawn width of a power-line corridor in plan, m (for hit-testing only; the wire itself is a line). */
export const WIRE_HIT_WIDTH = 0.6;

export function obstacleLocalOutline(o: ObstacleObject): Polygon {
  const s = o.shape;
  if (s.kind === 'rect') return rectPolygon(s.length, s.width);
  if (s.kind === 'circle') return circlePolygon(s.diameter);
  if (s.kind === 'polygon') return s.points;
  return rectPolygon(s.length, WIRE_HIT_WIDTH);
}

export const obstacleFootprints = (o: ObstacleObject): Polygon[] => [placePolygon(obstacleLocalOutline(o), o)];

/** A power line's wire ends in the site frame. */
export function wireEnds(o: ObstacleObject): [Pt, Pt] | null {
  if (o.shape.kind !== 'line') return null;
  const h = o.shape.length / 2;
  return [placePoint({ x: -h, y: 0 }, o), placePoint({ x: h, y: 0 }, o)];
}
