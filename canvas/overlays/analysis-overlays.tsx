'use client';
import { Arrow, Circle, Line } from 'react-konva';
import { PAL, DASH_OVER, DASH_PLAN } from '../view/palette';
import { useOverlayGeometry } from './use-overlay';
import { useEditorState } from '../editor-context';

/** The boom's plan line at the slew of a clearance mark: long dash, dot (not the load's dotted outline). */
const DASH_BOOM = [12, 4, 2, 4];

const flat = (poly: { x: number; y: number }[]) => poly.flatMap((p) => [p.x, p.y]);

/**
 * The swing check on the plan (world group, metres): approach zones, the swept band and planned arc, the
 * support polygon with each tipping line, the worst-case ray, the load's clearance marks and the boom's (its
 * plan line at the slew of its nearest approach, and the gap from its nearest point). A failed item is
 * red, dashed and labelled (see ./analysis-labels and ./label-placement), so colour is never the only sign.
 */
export function AnalysisOverlays() {
  const g = useOverlayGeometry();
  const pxPerM = useEditorState((s) => s.camera.pxPerM);
  if (!g) return null;
  const last = g.arc[g.arc.length - 1];
  const prev = g.arc[Math.max(0, g.arc.length - 2)];
  return (
    <>
      {g.powerZones.map((z) => (
        <Line key={z.id} points={flat(z.polygon)} closed fill={PAL.overLight} perfectDrawEnabled={false} opacity={0.55} stroke={PAL.over} strokeWidth={2} dash={DASH_OVER} strokeScaleEnabled={false} />
      ))}
      <Line points={flat(g.band)} closed fill={PAL.amber} perfectDrawEnabled={false} opacity={0.14} stroke={PAL.amberDark} strokeWidth={1} dash={DASH_PLAN} strokeScaleEnabled={false} />
      <Arrow
        points={flat([...g.arc.slice(0, -1), prev, last])}
        stroke={PAL.amberDark}
        fill={PAL.amberDark}
        strokeWidth={3}
        pointerLength={14 / pxPerM}
        pointerWidth={12 / pxPerM}
        strokeScaleEnabled={false}
      />
      <Circle x={g.pick.x} y={g.pick.y} radius={6 / pxPerM} fill={PAL.paper} stroke={PAL.amberDark} strokeWidth={2.5} strokeScaleEnabled={false} />
      <Circle x={g.set.x} y={g.set.y} radius={6 / pxPerM} fill={PAL.amberDark} />
      <Line points={flat(g.hull)} closed fill={PAL.tealLight} perfectDrawEnabled={false} opacity={0.35} />
      {g.lines.map((l) => (
        <Line
          key={l.id}
          points={[l.a.x, l.a.y, l.b.x, l.b.y]}
          stroke={l.over ? PAL.over : l.governing ? PAL.teal : PAL.inkSoft}
          strokeWidth={l.governing || l.over ? 4 : 2}
          dash={l.over ? DASH_OVER : undefined}
          strokeScaleEnabled={false}
        />
      ))}
      {g.worst && (
        <Line points={[g.worst.from.x, g.worst.from.y, g.worst.to.x, g.worst.to.y]} stroke={g.worst.over ? PAL.over : PAL.ink} strokeWidth={2.5} dash={[14, 5, 3, 5]} strokeScaleEnabled={false} />
      )}
      {g.clearances.map((c) => (
        <Line key={`c-${c.target}`} points={[c.p.x, c.p.y, c.q.x, c.q.y]} stroke={c.ok ? PAL.teal : PAL.over} strokeWidth={2} dash={c.ok ? undefined : DASH_OVER} strokeScaleEnabled={false} />
      ))}
      {g.clearances.map((c) => (
        <Line key={`o-${c.target}`} points={flat(g.loadAt(c.slew))} closed stroke={c.ok ? PAL.teal : PAL.over} strokeWidth={1} dash={[3, 4]} perfectDrawEnabled={false} opacity={0.7} strokeScaleEnabled={false} />
      ))}
      {g.boomClearances.map((c) => (
        <Line key={`bl-${c.kind}-${c.target}`} points={[c.boom[0].x, c.boom[0].y, c.boom[1].x, c.boom[1].y]} stroke={c.ok ? PAL.inkSoft : PAL.over} strokeWidth={2} dash={DASH_BOOM} opacity={0.8} strokeScaleEnabled={false} />
      ))}
      {g.boomClearances.map((c) => (
        <Line key={`bc-${c.kind}-${c.target}`} points={[c.p.x, c.p.y, c.q.x, c.q.y]} stroke={c.ok ? PAL.teal : PAL.over} strokeWidth={2.5} dash={c.ok ? undefined : DASH_OVER} strokeScaleEnabled={false} />
      ))}
      {g.boomClearances.map((c) => (
        <Circle key={`bp-${c.kind}-${c.target}`} x={c.p.x} y={c.p.y} radius={4 / pxPerM} fill={c.ok ? PAL.teal : PAL.over} stroke={PAL.paper} strokeWidth={1} strokeScaleEnabled={false} />
      ))}
      {g.nearestNow && <Line points={[g.nearestNow.p.x, g.nearestNow.p.y, g.nearestNow.q.x, g.nearestNow.q.y]} stroke={PAL.amberDark} strokeWidth={2} strokeScaleEnabled={false} />}
    </>
  );
}
