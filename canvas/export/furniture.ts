import type { Pt } from '@/lib/scene/geometry/vec';
import { PAL } from '../view/palette';
import { M_PER_FT, type UnitSystem } from '@/lib/units';
import type { DrawItem } from './drawing-types';

/** Round lengths a scale bar may show, in the viewer's unit (feet or metres). */
const NICE = [1, 2, 5, 10, 20, 25, 50, 100, 200, 250, 500, 1000];

/**
 * A scale bar of four alternating blocks, at most `maxWidth` points long, labelled in the viewer's unit with
 * the other system in brackets at its end.
 */
export function scaleBar(units: UnitSystem, ptPerM: number, at: Pt, maxWidth: number): DrawItem[] {
  const mPerUnit = units === 'imperial' ? M_PER_FT : 1;
  const unit = units === 'imperial' ? 'ft' : 'm';
  const total = [...NICE].reverse().find((n) => n * mPerUnit * ptPerM <= maxWidth) ?? NICE[0];
  const blockPt = (total * mPerUnit * ptPerM) / 4;
  const items: DrawItem[] = [];
  for (let i = 0; i < 4; i++) {
    const x = at.x + i * blockPt;
    items.push({ t: 'poly', pts: [{ x, y: at.y }, { x: x + blockPt, y: at.y }, { x: x + blockPt, y: at.y + 4 }, { x, y: at.y + 4 }], closed: true, stroke: PAL.ink, fill: i % 2 ? '#FFFFFF' : PAL.ink, width: 0.5 });
  }
  const metres = total * mPerUnit;
  const other = units === 'imperial' ? `${metres.toFixed(2)} m` : `${(metres / M_PER_FT).toFixed(1)} ft`;
  items.push({ t: 'text', x: at.x, y: at.y - 2, text: '0', size: 6, colour: PAL.ink, anchor: 'middle' });
  items.push({ t: 'text', x: at.x + 2 * blockPt, y: at.y - 2, text: `${total / 2}`, size: 6, colour: PAL.ink, anchor: 'middle' });
  items.push({ t: 'text', x: at.x + 4 * blockPt, y: at.y - 2, text: `${total} ${unit} (${other})`, size: 6, colour: PAL.ink, anchor: 'start' });
  return items;
}

/** North arrow: site +y is north; the drawing is never rotated, so it points straight up the page. */
export function northArrow(at: Pt): DrawItem[] {
  return [
    { t: 'poly', pts: [{ x: at.x, y: at.y - 14 }, { x: at.x + 6, y: at.y + 8 }, { x: at.x, y: at.y + 3 }], closed: true, stroke: PAL.ink, fill: PAL.ink, width: 0.6 },
    { t: 'poly', pts: [{ x: at.x, y: at.y - 14 }, { x: at.x - 6, y: at.y + 8 }, { x: at.x, y: at.y + 3 }], closed: true, stroke: PAL.ink, fill: '#FFFFFF', width: 0.6 },
    { t: 'text', x: at.x, y: at.y - 17, text: 'N', size: 9, colour: PAL.ink, anchor: 'middle', bold: true },
  ];
}
