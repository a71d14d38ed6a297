'use client';
import { Layer, Label, Tag, Text } from 'react-konva';
import { useEditorState } from '../editor-context';
import { worldToScreen } from '../editor/camera';
import { formatLength } from '@/lib/units';
import { tapeLength } from '../shapes/tape/geometry';
import { PAL } from './palette';
import { AnalysisLabels } from '../overlays/analysis-labels';

/** Text at a fixed pixel size, placed from site positions: notes, tape lengths and object labels. */
export function LabelLayer() {
  const objects = useEditorState((s) => s.document.objects);
  const camera = useEditorState((s) => s.camera);
  const vp = useEditorState((s) => s.viewport);
  const units = useEditorState((s) => s.units);
  const model = useEditorState((s) => s.truck);
  const at = (x: number, y: number) => worldToScreen(camera, vp, { x, y });
  return (
    <Layer listening={false}>
      <AnalysisLabels />
      {objects.map((o) => {
        if (o.kind === 'note') {
          const p = at(o.x, o.y);
          return (
            <Label key={o.id} x={p.x} y={p.y}>
              <Tag fill="#FFF8DC" stroke={PAL.amberDark} strokeWidth={1} cornerRadius={3} />
              <Text text={o.text} fontSize={14} fontFamily="Inter Tight" fill={PAL.ink} padding={6} lineHeight={1.2} />
            </Label>
          );
        }
        if (o.kind === 'tape') {
          const p = at((o.x + o.x2) / 2, (o.y + o.y2) / 2);
          return (
            <Label key={o.id} x={p.x} y={p.y - 14}>
              <Tag fill={PAL.teal} cornerRadius={3} pointerDirection="down" pointerWidth={8} pointerHeight={5} />
              <Text text={formatLength(tapeLength(o), units)} fontSize={13} fontStyle="600" fontFamily="Inter Tight" fill="#fff" padding={4} />
            </Label>
          );
        }
        if (!o.label && o.kind !== 'truck') return null;
        const p = at(o.x, o.y);
        const text = o.kind === 'truck' ? `${model?.unitNumber ?? 'Truck'}${model?.exampleOutline ? ' · example outline' : ''}` : o.label;
        return <Text key={o.id} x={p.x + 8} y={p.y + 8} text={text} fontSize={12} fontStyle="600" fontFamily="Inter Tight" fill={PAL.ink} />;
      })}
    </Layer>
  );
}
