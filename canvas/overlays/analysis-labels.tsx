'use client';
import { Label, Line, Tag, Text } from 'react-konva';
import type { UnitSystem } from '@/lib/units';
import { tippingLineShort, tippingMargin } from '@/lib/format/checks';
import { formatAngle, formatLength, formatPercent } from '@/lib/format/quantity';
import { PAL } from '../view/palette';
import type { OverlayGeometry } from '../analysis/overlay-geometry';
import type { Pt } from '@/lib/scene/geometry/vec';
import type { LabelBox } from './label-placement';


export type PillTone = 'ok' | 'over' | 'plain' | 'live' | 'text';

/** One pill the plan wants to show: where it points, what it says, how much it matters. */
export interface PillItem {
  key: string;
  anchor: Pt;
  text: string;
  tone: PillTone;
  priority: number;
}

export const PILL_FONT = 12;
export const PILL_PAD = 4;

export function Pill({ box, text, tone, leaderFrom }: { box: LabelBox; text: string; tone: PillTone; leaderFrom?: { from: Pt; to: Pt } | null }) {
  const fill = tone === 'over' ? PAL.over : tone === 'ok' ? PAL.teal : tone === 'live' ? PAL.amber : PAL.paper;
  const ink = tone === 'plain' || tone === 'live' || tone === 'text' ? PAL.ink : '#FFFFFF';
  return (
    <>
      {leaderFrom && <Line points={[leaderFrom.from.x, leaderFrom.from.y, leaderFrom.to.x, leaderFrom.to.y]} stroke={tone === 'over' ? PAL.over : PAL.inkSoft} strokeWidth={1} dash={[2, 2]} listening={false} />}
      <Label x={box.x} y={box.y}>
        {tone !== 'text' && <Tag fill={fill} stroke={PAL.ink} strokeWidth={tone === 'plain' ? 1 : 0} cornerRadius={3} perfectDrawEnabled={false} opacity={0.95} />}
        <Text text={text} fontSize={PILL_FONT} fontStyle="600" fontFamily="Inter Tight" fill={ink} padding={PILL_PAD} />
      </Label>
    </>
  );
}

/**
 * The swing check's words and numbers, anchored beside what they describe. Over-limit items come first
 * so they get the clearest spots; lines the load cannot tip the truck about (0 %) stay unlabelled.
 */
export function analysisPillItems(g: OverlayGeometry, at: (p: Pt) => Pt, units: UnitSystem): PillItem[] {
  const out: PillItem[] = [];
  for (const z of g.powerZones) {
    const req = z.required === null ? 'set by the utility' : formatLength(z.required, units);
    out.push({ key: `zone-${z.id}`, anchor: at(z.at), tone: z.ok ? 'plain' : 'over', priority: z.ok ? 3 : 0, text: `${z.name}: keep ${req} away${z.ok ? '' : ` — OVER LIMIT, ${formatLength(z.distance, units)}`}` });
  }
  for (const l of g.lines) {
    if (!l.governing && !l.over && l.percent <= 0) continue;
    const text = `${tippingLineShort({ side: l.side, code: l.id })}: ${tippingMargin(l.percent, l.percent + l.margin)}${l.over ? ' — OVER LIMIT' : ''}`;
    out.push({ key: `line-${l.id}`, anchor: at({ x: (l.a.x + l.b.x) / 2, y: (l.a.y + l.b.y) / 2 }), tone: l.over ? 'over' : l.governing ? 'ok' : 'plain', priority: l.over ? 0 : l.governing ? 2 : 4, text });
  }
  if (g.worst) {
    out.push({ key: 'worst', anchor: at(g.worst.to), tone: g.worst.over ? 'over' : 'plain', priority: 1, text: `Worst case ${formatAngle(g.worst.slew)}: ${formatPercent(g.worst.percent)} of tipping about the ${tippingLineShort({ side: g.worst.side, code: g.worst.line })}${g.worst.over ? ' — OVER LIMIT' : ''}` });
  }
  for (const c of g.clearances) {
    const v = `${c.vertical ? 'above by ' : ''}${formatLength(c.value, units)}`;
    out.push({ key: `clear-${c.target}`, anchor: at({ x: (c.p.x + c.q.x) / 2, y: (c.p.y + c.q.y) / 2 }), tone: c.ok ? 'ok' : 'over', priority: c.ok ? 3 : 0, text: `${c.name} ${v}${c.ok ? '' : ' OVER LIMIT'}` });
  }
  for (const c of g.boomClearances) {
    const limit = c.kind === 'power-line' ? ` (keep ${c.limit === null ? 'the distance the utility sets' : formatLength(c.limit, units)})` : '';
    const verdict = c.strikes ? ' — STRIKES' : c.ok ? '' : ' — OVER LIMIT';
    out.push({ key: `boom-${c.kind}-${c.target}`, anchor: at({ x: (c.p.x + c.q.x) / 2, y: (c.p.y + c.q.y) / 2 }), tone: c.ok ? 'ok' : 'over', priority: c.ok ? 3 : 0, text: `Boom to ${c.name}: ${formatLength(c.value, units)}${limit} at ${formatAngle(c.slew)}${verdict}` });
  }
  return out;
}
