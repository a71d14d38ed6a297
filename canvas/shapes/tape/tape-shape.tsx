'use client';
import { Group, Line, Circle } from 'react-konva';
import type { TapeObject } from '@/lib/scene/objects';
import { PAL } from '../../view/palette';

/** A measuring tape: a line with end ticks (its length label is drawn in screen space). */
export function TapeShape({ tape, pxPerM }: { tape: TapeObject; pxPerM: number }) {
  const r = 4 / pxPerM;
  return (
    <Group listening={false}>
      <Line points={[tape.x, tape.y, tape.x2, tape.y2]} stroke={PAL.teal} strokeWidth={2.5} dash={[8, 4]} strokeScaleEnabled={false} />
      <Circle x={tape.x} y={tape.y} radius={r} fill={PAL.teal} />
      <Circle x={tape.x2} y={tape.y2} radius={r} fill={PAL.teal} />
    </Group>
  );
}
