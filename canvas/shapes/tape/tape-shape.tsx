'use client';
import { memo } from 'react';
import { Group, Line, Circle } from 'react-konva';
import type { TapeObject } from '@/lib/scene/objects';
import { PAL } from '../../view/palette';

const DASH = [8, 4];

/**
 * A measuring tape: a line with end ticks (its length label is drawn in screen space). Memoised like the
 * other scene shapes: one shape that re-renders with fresh arrays makes Konva redraw the whole scene layer.
 */
export const TapeShape = memo(function TapeShape({ tape, pxPerM }: { tape: TapeObject; pxPerM: number }) {
  const r = 4 / pxPerM;
  return (
    <Group listening={false}>
      <Line points={[tape.x, tape.y, tape.x2, tape.y2]} stroke={PAL.teal} strokeWidth={2.5} dash={DASH} strokeScaleEnabled={false} />
      <Circle x={tape.x} y={tape.y} radius={r} fill={PAL.teal} />
      <Circle x={tape.x2} y={tape.y2} radius={r} fill={PAL.teal} />
    </Group>
  );
});
