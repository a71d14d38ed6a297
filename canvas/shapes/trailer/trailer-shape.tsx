'use client';
import { memo } from 'react';
import { Group, Line } from 'react-konva';
import type { TrailerObject } from '@/lib/scene/objects';
import { placePolygon, rectPolygon } from '@/lib/scene/geometry/vec';
import { PAL } from '../../view/palette';
import { trailerFootprints } from '@/lib/scene/geometry/trailer';

const flat = (poly: { x: number; y: number }[]) => poly.flatMap((p) => [p.x, p.y]);

/** A flat deck with its kingpin end marked (the end at local +x). */
export const TrailerShape = memo(function TrailerShape({ trailer }: { trailer: TrailerObject }) {
  const [deck] = trailerFootprints(trailer);
  const nose = placePolygon(rectPolygon(0.4, trailer.width).map((p) => ({ x: p.x + trailer.length / 2 - 0.2, y: p.y })), trailer);
  return (
    <Group listening={false}>
      <Line points={flat(deck)} closed fill={PAL.trailerFill} stroke={PAL.ink} strokeWidth={1.5} strokeScaleEnabled={false} />
      <Line points={flat(nose)} closed fill={PAL.inkSoft} perfectDrawEnabled={false} opacity={0.6} />
    </Group>
  );
});
