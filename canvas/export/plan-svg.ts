import type { DrawItem, PlanDrawing } from './drawing-types';

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

export function planSvg(d: PlanDrawing, title: string): string {
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${d.width}pt" height="${d.height}pt" viewBox="0 0 ${d.width} ${d.height}" font-family="'Inter Tight', Arial, sans-serif">`,
    `<title>${esc(title)}: plan drawing, scale ${esc(d.scaleLabel)}</title>`,
    ...d.items.map(item),
    '</svg>',
  ].join('\n');
}
