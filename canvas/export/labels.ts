import type { Pt } from '@/lib/scene/geometry/vec';
import type { DrawItem } from './drawing-types';

export interface LabelRequest {
  text: string;
  size: number;
  colour: string;
  bold?: boolean;
}

type Box = { x: number; y: number; w: number; h: number };

/** Inter Tight's average advance is a little over half the size; 0.52 errs a little wide so boxes do not touch. */
const ADVANCE = 0.52;

/**
 * Greedy label placement for the exported drawing: each label tries positions around its anchor (right,
 * left, above, below, then further out) and takes the first that stays on the paper and clear of the
 * labels already placed and of `blocked` (scale bar, north arrow). A label with no free spot is left out,
 * never drawn over another; the tables carry every figure anyway.
 */
export function placeLabels(requests: (LabelRequest & { at: Pt })[], width: number, height: number, blocked: Box[]): DrawItem[] {
  const taken: Box[] = [...blocked];
  const out: DrawItem[] = [];
  for (const r of requests) {
    const w = r.text.length * r.size * ADVANCE;
    const h = r.size * 1.25;
    const gap = 4;
    const candidates: Box[] = [];
    for (const k of [1, 2.5, 4.5]) {
      const g = gap * k;
      candidates.push(
        { x: r.at.x + g, y: r.at.y - h / 2, w, h },
        { x: r.at.x - g - w, y: r.at.y - h / 2, w, h },
        { x: r.at.x - w / 2, y: r.at.y - g - h, w, h },
        { x: r.at.x - w / 2, y: r.at.y + g, w, h },
        { x: r.at.x + g, y: r.at.y - g - h, w, h },
        { x: r.at.x + g, y: r.at.y + g, w, h },
      );
    }
    const spot = candidates.find((c) => c.x >= 2 && c.y >= 2 && c.x + c.w <= width - 2 && c.y + c.h <= height - 2 && !taken.some((t) => overlaps(t, c)));
    if (!spot) continue;
    taken.push(spot);
    // A pale backing keeps the words readable over fills and lines (PDF SVG has no text halo).
    const pad = 1;
    out.push({ t: 'poly', pts: [{ x: spot.x - pad, y: spot.y }, { x: spot.x + spot.w, y: spot.y }, { x: spot.x + spot.w, y: spot.y + spot.h }, { x: spot.x - pad, y: spot.y + spot.h }], closed: true, stroke: null, fill: '#FFFFFF', width: 0, opacity: 0.82 });
    out.push({ t: 'text', x: spot.x, y: spot.y + r.size * 0.95, text: r.text, size: r.size, colour: r.colour, anchor: 'start', bold: r.bold });
  }
  return out;
}

const overlaps = (a: Box, b: Box) => a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
