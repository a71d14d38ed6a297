import type { DrawItem, PlanDrawing } from './drawing-types';
import { CAUTION_LINES } from '@/lib/caution';

/**
 * The plan drawing as a standalone SVG document, sized in points so it prints at its stated scale.
 * The same items the PDF draws; only the writer differs.
 */
const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const n = (v: number) => (Math.round(v * 100) / 100).toString();
export const pointsAttr = (pts: { x: number; y: number }[]) => pts.map((p) => `${n(p.x)},${n(p.y)}`).join(' ');

function item(i: DrawItem): string {
  if (i.t === 'poly') {
    const tag = i.closed ? 'polygon' : 'polyline';
    const dash = i.dash ? ` stroke-dasharray="${i.dash.join(' ')}"` : '';
    const op = i.opacity !== undefined ? ` opacity="${i.opacity}"` : '';
    return `<${tag} points="${pointsAttr(i.pts)}" fill="${i.fill ?? 'none'}" stroke="${i.stroke ?? 'none'}" stroke-width="${i.width}"${dash}${op} stroke-linejoin="round"/>`;
  }
  if (i.t === 'circle') return `<circle cx="${n(i.x)}" cy="${n(i.y)}" r="${i.r}" fill="${i.fill ?? 'none'}" stroke="${i.stroke ?? 'none'}" stroke-width="${i.width}"/>`;
  const weight = i.bold ? ' font-weight="700"' : '';
  return `<text x="${n(i.x)}" y="${n(i.y)}" font-size="${i.size}" fill="${i.colour}" text-anchor="${i.anchor}"${weight}>${esc(i.text)}</text>`;
}

/** Points below the drawing for the pad key and the standing caution (lib/caution.ts): a figure never travels without it. */
export const CAUTION_STRIP_PT = 44;

/** The whole exported image's height, drawing and caution strip. */
export const svgHeight = (d: PlanDrawing) => d.height + CAUTION_STRIP_PT;

function cautionStrip(d: PlanDrawing): string[] {
  const y0 = d.height;
  const line = (i: number, text: string, bold = false): string => item({ t: 'text', x: 8, y: y0 + 10 + i * 8.5, text, size: 6.5, colour: '#1F2328', anchor: 'start', bold });
  return [
    `<rect x="0" y="${y0}" width="${d.width}" height="${CAUTION_STRIP_PT}" fill="#FFF4D6" stroke="#1F2328" stroke-width="0.5"/>`,
    line(0, d.padKey ?? '', false),
    line(1, 'CAUTION — planning aid, read before use:', true),
    ...CAUTION_LINES.slice(0, 2).map((l, i) => line(2 + i, l)),
  ].concat(item({ t: 'text', x: d.width - 8, y: y0 + 10 + 3 * 8.5, text: CAUTION_LINES[2], size: 6.5, colour: '#1F2328', anchor: 'end' }));
}

export function planSvg(d: PlanDrawing, title: string): string {
  const h = svgHeight(d);
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${d.width}pt" height="${h}pt" viewBox="0 0 ${d.width} ${h}" font-family="'Inter Tight', Arial, sans-serif">`,
    `<title>${esc(title)}: plan drawing, scale ${esc(d.scaleLabel)}</title>`,
    ...d.items.map(item),
    ...cautionStrip(d),
    '</svg>',
  ].join('\n');
}
