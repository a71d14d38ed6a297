'use client';
import { memo } from 'react';
import { Circle, Group, Line } from 'react-konva';
import type { LoadObject } from '@/lib/scene/objects';
import { placePolygon } from '@/lib/scene/geometry/vec';
import { PAL, DASH_PLAN } from '../../view/palette';
import { loadLocalOutline } from '@/lib/scene/geometry/load';

const flat = (poly: { x: number; y: number }[]) => poly.flatMap((p) => [p.x, p.y]);

/** The load where it rests before the pick: a dashed outline with its eye or CG mark. */
export const LoadRestShape = memo(function LoadRestShape({ load }: { load: LoadObject }) {
  const outline = placePolygon(loadLocalOutline(load.shape), load);
  const s = load.shape;
  return (
    <Group listening={false}>
      <Line points={flat(outline)} closed fill={PAL.loadFill} perfectDrawEnabled={false} opacity={0.25} stroke={PAL.amberDark} strokeWidth={2} dash={DASH_PLAN} strokeScaleEnabled={false} />
      {s.kind === 'coil' && s.eye === 'vertical' && <Circle x={load.x} y={load.y} radius={s.innerDiameter / 2} stroke={PAL.amberDark} strokeWidth={1.5} strokeScaleEnabled={false} />}
    </Group>
  );
});

/** The load hanging under the hook at the current slew, turned with the boom. */
export function LoadHangingShape({ load, at, rotation }: { load: LoadObject; at: { x: number; y: number }; rotation: number }) {
  const pose = { x: at.x, y: at.y, rotation };
  const outline = placePolygon(loadLocalOutline(load.shape), pose);
  const s = load.shape;
  return (
    <Group listening={false}>
      <Line points={flat(outline)} closed fill={PAL.loadFill} perfectDrawEnabled={false} opacity={0.9} stroke={PAL.ink} strokeWidth={1.5} strokeScaleEnabled={false} />
      {s.kind === 'coil' && s.eye === 'vertical' && <Circle x={at.x} y={at.y} radius={s.innerDiameter / 2} fill={PAL.paper} stroke={PAL.ink} strokeWidth={1} strokeScaleEnabled={false} />}
      {s.kind === 'coil' && s.eye === 'horizontal' && (
        <Line points={flat(placePolygon([{ x: -s.width / 2, y: 0 }, { x: s.width / 2, y: 0 }], pose))} stroke={PAL.ink} strokeWidth={1} dash={[4, 3]} strokeScaleEnabled={false} />
      )}
    </Group>
  );
}
