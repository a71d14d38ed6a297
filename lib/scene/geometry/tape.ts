import type { TapeObject } from '../objects';
import type { Polygon } from './vec';

export const tapeLength = (t: TapeObject) => Math.hypot(t.x2 - t.x, t.y2 - t.y);

/** A thin sliver along the tape, so that hit-testing treats it like any outline. */
export function tapeFootprints(t: TapeObject, halfWidth: number): Polygon[] {
  const len = tapeLength(t) || 1;
  const nx = (-(t.y2 - t.y) / len) * halfWidth;
  const ny = ((t.x2 - t.x) / len) * halfWidth;
  return [
    [
      { x: t.x + nx, y: t.y + ny },
      { x: t.x2 + nx, y: t.y2 + ny },
      { x: t.x2 - nx, y: t.y2 - ny },
      { x: t.x - nx, y: t.y - ny },
    ],
  ];
}
