'use client';
import { Label, Tag, Text } from 'react-konva';
import { useEditorState } from '../editor-context';
import { worldToScreen } from '../editor/camera';
import { formatLength } from '@/lib/units';
import { PAL } from '../view/palette';
import { useOverlayGeometry } from './use-overlay';

const pct = (n: number) => `${n.toFixed(1)} %`;

function Pill({ x, y, text, tone, testId }: { x: number; y: number; text: string; tone: 'ok' | 'over' | 'plain' | 'live'; testId?: string }) {
  const fill = tone === 'over' ? PAL.over : tone === 'ok' ? PAL.teal : tone === 'live' ? PAL.amber : PAL.paper;
  const ink = tone === 'plain' || tone === 'live' ? PAL.ink : '#FFFFFF';
  return (
    <Label x={x} y={y} name={testId}>
      <Tag fill={fill} stroke={PAL.ink} strokeWidth={tone === 'plain' ? 1 : 0} cornerRadius={3} perfectDrawEnabled={false} opacity={0.95} />
      <Text text={text} fontSize={12} fontStyle="600" fontFamily="Inter Tight" fill={ink} padding={4} />
    </Label>
  );
}

/** The swing check's words and numbers, at a fixed pixel size beside what they describe. */
export function AnalysisLabels() {
  const g = useOverlayGeometry();
  const camera = useEditorState((s) => s.camera);
  const vp = useEditorState((s) => s.viewport);
  const units = useEditorState((s) => s.units);
  if (!g) return null;
  const at = (p: { x: number; y: number }) => worldToScreen(camera, vp, p);
  return (
    <>
      {g.powerZones.map((z) => {
        const p = at(z.at);
        const req = z.required === null ? 'set by the utility' : formatLength(z.required, units);
        return <Pill key={z.id} x={p.x + 6} y={p.y + 6} tone={z.ok ? 'plain' : 'over'} text={`${z.name}: keep ${req} away${z.ok ? '' : ` — OVER LIMIT, ${formatLength(z.distance, units)}`}`} />;
      })}
      {g.lines.map((l) => {
        // Lines the load cannot tip the truck about (0 %) stay unlabelled, to keep the plan readable.
        if (!l.governing && !l.over && l.percent <= 0) return null;
        const p = at({ x: (l.a.x + l.b.x) / 2, y: (l.a.y + l.b.y) / 2 });
        const text = l.over ? `${l.id} OVER by ${(-l.margin).toFixed(1)} pts` : `${l.id} margin ${l.margin.toFixed(1)} pts`;
        return <Pill key={l.id} x={p.x - 40} y={p.y - 10} tone={l.over ? 'over' : l.governing ? 'ok' : 'plain'} text={text} />;
      })}
      {g.worst && (() => {
        const p = at(g.worst.to);
        return <Pill x={p.x + 4} y={p.y - 10} tone={g.worst.over ? 'over' : 'plain'} text={`Worst case ${g.worst.slew.toFixed(1)}°: ${pct(g.worst.percent)} of tipping about ${g.worst.line}${g.worst.over ? ' — OVER LIMIT' : ''}`} />;
      })()}
      {g.clearances.map((c) => {
        const p = at({ x: (c.p.x + c.q.x) / 2, y: (c.p.y + c.q.y) / 2 });
        const v = `${c.vertical ? 'above by ' : ''}${formatLength(c.value, units)}`;
        return <Pill key={c.target} x={p.x + 4} y={p.y + 4} tone={c.ok ? 'ok' : 'over'} text={`${c.name} ${v}${c.ok ? '' : ' OVER LIMIT'}`} />;
      })}
    </>
  );
}
