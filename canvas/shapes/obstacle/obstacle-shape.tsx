'use client';
import { memo } from 'react';
import { Circle, Group, Line } from 'react-konva';
import type { ObstacleObject } from '@/lib/scene/objects';
import { PAL } from '../../view/palette';
import { MIN_DRAWN_PX } from '../../editor/handles';
import { obstacleFootprints, wireEnds } from '@/lib/scene/geometry/obstacle';

const flat = (poly: { x: number; y: number }[]) => poly.flatMap((p) => [p.x, p.y]);

/** Obstacles by kind; a power line is a wire (its approach zone is an overlay). */
const RING_DASH = [3, 2];
const LANE_DASH = [12, 8];

export const ObstacleShape = memo(function ObstacleShape({ obstacle, pxPerM }: { obstacle: ObstacleObject; pxPerM?: number }) {
  const colour = PAL.obstacle[obstacle.obstacleKind] ?? PAL.muted;
  const ends = wireEnds(obstacle);
  if (ends) {
    return <Line listening={false} points={[ends[0].x, ends[0].y, ends[1].x, ends[1].y]} stroke={colour} strokeWidth={3} strokeScaleEnabled={false} />;
  }
  const [poly] = obstacleFootprints(obstacle);
  const lane = obstacle.obstacleKind === 'traffic-lane';
  const xs = poly.map((p) => p.x);
  const ys = poly.map((p) => p.y);
  const sizePx = pxPerM ? Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) * pxPerM : Infinity;
  return (
    <Group listening={false}>
      {/* Too small to see at this zoom: a ring at the minimum size marks where it stands (the outline inside stays true to size). */}
      {sizePx < MIN_DRAWN_PX && pxPerM && (
        <Circle x={obstacle.x} y={obstacle.y} radius={MIN_DRAWN_PX / 2 / pxPerM} fill={colour} opacity={0.35} stroke={PAL.ink} strokeWidth={1.5} dash={RING_DASH} strokeScaleEnabled={false} perfectDrawEnabled={false} />
      )}
      <Line
        points={flat(poly)}
        closed
        fill={colour}
        perfectDrawEnabled={false} opacity={lane ? 0.45 : obstacle.obstacleKind === 'tree' ? 0.55 : 0.75}
        stroke={PAL.ink}
        strokeWidth={1}
        dash={lane ? LANE_DASH : undefined}
        strokeScaleEnabled={false}
      />
    </Group>
  );
});
