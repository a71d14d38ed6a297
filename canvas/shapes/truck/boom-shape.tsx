'use client';
import { Group, Line, Circle } from 'react-konva';
import type { TruckObject } from '@/lib/scene/objects';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import { PAL } from '../../view/palette';
import { hookSitePoint, pivotSitePoint } from '@/lib/scene/geometry/truck';

/** The boom in plan at a slew angle, from pivot to tip, with the hook. */
export function BoomShape({ truck, model, slew, pxPerM }: { truck: TruckObject; model: TruckModel; slew: number; pxPerM: number }) {
  const a = pivotSitePoint(truck, model, slew);
  const b = hookSitePoint(truck, model, slew);
  return (
    <Group listening={false}>
      <Line points={[a.x, a.y, b.x, b.y]} stroke={PAL.ink} strokeWidth={Math.max(6, 0.45 * pxPerM)} lineCap="round" strokeScaleEnabled={false} perfectDrawEnabled={false} opacity={0.9} />
      <Line points={[a.x, a.y, b.x, b.y]} stroke={PAL.amber} strokeWidth={Math.max(2, 0.15 * pxPerM)} lineCap="round" strokeScaleEnabled={false} />
      <Circle x={b.x} y={b.y} radius={7 / pxPerM} fill={PAL.amber} stroke={PAL.ink} strokeWidth={2} strokeScaleEnabled={false} />
    </Group>
  );
}
