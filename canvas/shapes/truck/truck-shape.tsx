'use client';
import { memo } from 'react';
import { Group, Line, Circle } from 'react-konva';
import type { TruckObject } from '@/lib/scene/objects';
import type { TruckModel } from '@/lib/scene/truck/truck-model';
import { PAL } from '../../view/palette';
import { truckPads, truckPartFootprints } from '@/lib/scene/geometry/truck';

const flat = (poly: { x: number; y: number }[]) => poly.flatMap((p) => [p.x, p.y]);

/** Draws the carrier outline, legs, pads and cribbing to size (world group, metres). Geometry comes from ./geometry. */
function TruckShapeInner({ truck, model }: { truck: TruckObject; model: TruckModel }) {
  const parts = truckPartFootprints(truck, model);
  const pads = truckPads(truck, model);
  return (
    <Group listening={false}>
      {pads.map((p) => (
        <Line key={`leg-${p.leg.id}`} points={[p.mount.x, p.mount.y, p.centre.x, p.centre.y]} stroke={PAL.inkSoft} strokeWidth={4} strokeScaleEnabled={false} />
      ))}
      {parts.map((p) => (
        <Line
          key={p.id}
          points={flat(p.polygon)}
          closed
          fill={p.kind === 'cab' ? PAL.cabFill : p.kind === 'tailboard' ? '#B7C2CC' : PAL.truckFill}
          stroke={PAL.ink}
          strokeWidth={1.5}
          strokeScaleEnabled={false}
        />
      ))}
      {pads.map((p) => (
        <Group key={`pad-${p.leg.id}`}>
          {p.cribbing && <Line points={flat(p.cribbing)} closed fill={PAL.cribFill} stroke={PAL.ink} strokeWidth={1} strokeScaleEnabled={false} />}
          <Line points={flat(p.pad)} closed fill={PAL.padFill} perfectDrawEnabled={false} opacity={0.85} />
        </Group>
      ))}
      <Circle x={truck.x} y={truck.y} radius={0.35} stroke={PAL.ink} strokeWidth={2} strokeScaleEnabled={false} fill={PAL.paper} />
    </Group>
  );
}

/** The boom swings at 60 fps; the body only redraws when the truck itself changes. */
export const TruckShape = memo(
  TruckShapeInner,
  (a, b) => a.model === b.model && a.truck.x === b.truck.x && a.truck.y === b.truck.y && a.truck.rotation === b.truck.rotation && a.truck.legs === b.truck.legs,
);
