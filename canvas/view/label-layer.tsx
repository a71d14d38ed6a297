'use client';
import { useRef, type ReactElement } from 'react';
import { Label, Tag, Text } from 'react-konva';
import { useEditorState } from '../editor-context';
import { worldToScreen } from '../editor/camera';
import { formatLength } from '@/lib/format/quantity';
import { tapeLength } from '@/lib/scene/geometry/tape';
import { PAL } from './palette';
import { analysisPillItems, Pill, PILL_FONT, PILL_PAD, type PillItem } from '../overlays/analysis-labels';
import { useOverlayGeometry } from '../overlays/use-overlay';
import { placeLabels, type LabelRequest } from '../overlays/label-placement';
import { textWidth } from '../overlays/measure-text';


const NOTE_FONT = 14;
const NOTE_PAD = 6;
const TAPE_FONT = 13;

/**
 * Text at a fixed pixel size, placed from site positions: notes, tape lengths, object labels and the swing
 * check's pills. Notes and tape lengths stay where they are; the rest are spread so none covers another.
 * Drawn in screen pixels on the live layer, after the world group: one canvas for all that moves.
 */
export function LabelLayer() {
  const objects = useEditorState((s) => s.document.objects);
  const camera = useEditorState((s) => s.camera);
  const vp = useEditorState((s) => s.viewport);
  const units = useEditorState((s) => s.units);
  const model = useEditorState((s) => s.truck);
  const g = useOverlayGeometry();
  const lastChoice = useRef<Map<string, number>>(new Map());
  const at = (p: { x: number; y: number }) => worldToScreen(camera, vp, p);

  const fixed: ReactElement[] = [];
  const requests: LabelRequest[] = [];
  const items = new Map<string, PillItem>();
  const want = (it: PillItem) => {
    items.set(it.key, it);
    requests.push({ key: it.key, anchor: it.anchor, w: textWidth(it.text, PILL_FONT) + 2 * PILL_PAD, h: PILL_FONT + 2 * PILL_PAD, priority: it.priority });
  };

  for (const o of objects) {
    if (o.kind === 'note') {
      const p = at(o);
      const lines = o.text.split('\n');
      const w = Math.max(...lines.map((l) => textWidth(l, NOTE_FONT, 'normal'))) + 2 * NOTE_PAD;
      requests.push({ key: o.id, anchor: p, w, h: lines.length * NOTE_FONT * 1.2 + 2 * NOTE_PAD, priority: 0, fixed: { x: p.x, y: p.y, w, h: lines.length * NOTE_FONT * 1.2 + 2 * NOTE_PAD } });
      fixed.push(
        <Label key={o.id} x={p.x} y={p.y}>
          <Tag fill="#FFF8DC" stroke={PAL.amberDark} strokeWidth={1} cornerRadius={3} />
          <Text text={o.text} fontSize={NOTE_FONT} fontFamily="Inter Tight" fill={PAL.ink} padding={NOTE_PAD} lineHeight={1.2} />
        </Label>,
      );
    } else if (o.kind === 'tape') {
      const p = at({ x: (o.x + o.x2) / 2, y: (o.y + o.y2) / 2 });
      const text = formatLength(tapeLength(o), units);
      const w = textWidth(text, TAPE_FONT) + 8;
      requests.push({ key: o.id, anchor: p, w, h: TAPE_FONT + 8, priority: 0, fixed: { x: p.x - w / 2, y: p.y - 14 - TAPE_FONT - 8, w, h: TAPE_FONT + 13 } });
      fixed.push(
        <Label key={o.id} x={p.x} y={p.y - 14}>
          <Tag fill={PAL.teal} cornerRadius={3} pointerDirection="down" pointerWidth={8} pointerHeight={5} />
          <Text text={text} fontSize={TAPE_FONT} fontStyle="600" fontFamily="Inter Tight" fill="#fff" padding={4} />
        </Label>,
      );
    } else if (o.label || o.kind === 'truck') {
      const text = o.kind === 'truck' ? `${model?.unitNumber ?? 'Truck'}${model?.exampleOutline ? ' · example outline' : ''}` : o.label;
      if (text) want({ key: o.id, anchor: at(o), text, tone: 'text', priority: 5 });
    }
  }
  if (g) for (const it of analysisPillItems(g, at, units)) want(it);

  // Labels keep the side they had last frame (no flicker while dragging): a cache across frames, not render state.
  // eslint-disable-next-line react-hooks/refs -- read and written only to carry the previous frame's placement
  const { placed, choice } = placeLabels(requests, vp, lastChoice.current);
  // eslint-disable-next-line react-hooks/refs -- see above
  lastChoice.current = choice;

  return (
    <>
      {fixed}
      {placed.map((p) => {
        const it = items.get(p.key);
        if (!it) return null;
        return <Pill key={p.key} box={p.box} text={it.text} tone={it.tone} leaderFrom={p.leader ? { from: it.anchor, to: p.leader } : null} />;
      })}
    </>
  );
}
