'use client';
import { memo } from 'react';
import { Group, Line } from 'react-konva';
import type { ObstacleObject } from '@/lib/scene/objects';
import { PAL } from '../../view/palette';
import { obstacleFootprints, wireEnds } from '@/lib/scene/geometry/obstacle';

const flat = (poly: { x: number; y: number }[]) => poly.flatMap((p) => [p.x, p.y]);

/** Obstacles by kind; a power line is a wire (its approach zone is an overlay). */
export const ObstacleShape = memo(function ObstacleShape({ obstacle }: { obstacle: ObstacleObject }) {
  const colour = PAL.obstacle[obstacle.obstacleKind] ?? PAL.muted;
  const ends = wireEnds(obstacle);
  if (ends) {
    return <Line listening={false} points={[ends[0].x, ends[0].y, ends[1].x, ends[1].y]} stroke={colour} strokeWidth={3} strokeScaleEnabled={false} />;
  }
  const [poly] = obstacleFootprints(obstacle);
  const lane = obstacle.obstacleKind === 'traffic-lane';
  return (
    <Group listening={false}>
      <Line
        points={flat(poly)}
        closed
        fill={colour}
        perfectDrawEnabled={false} opacity={lane ? 0.45 : obstacle.obstacleKind === 'tree' ? 0.55 : 0.75}
        stroke={PAL.ink}
        strokeWidth={1}
        dash={lane ? [12, 8] : undefined}
        strokeScaleEnabled={false}
      />
    </Group>
  );
});
