import { Circle, Polygon, Polyline, Svg, Text as SvgText } from '@react-pdf/renderer';
import type { PlanDrawing } from '@/canvas/export/drawing-types';
import { pointsAttr } from '@/canvas/export/plan-svg';
import { PDF_FONT } from './fonts';

/** The plan drawing as vector paths in the PDF, at its stated scale (1 SVG unit = 1 pt). */
export function DrawingSvg({ d }: { d: PlanDrawing }) {
  return (
    <Svg width={d.width} height={d.height} viewBox={`0 0 ${d.width} ${d.height}`}>
      {d.items.map((i, k) => {
        if (i.t === 'poly') {
          const props = {
            points: pointsAttr(i.pts),
            fill: i.fill ?? 'none',
            stroke: i.stroke ?? 'none',
            strokeWidth: i.width,
            ...(i.dash ? { strokeDasharray: i.dash.join(' ') } : {}),
            ...(i.opacity !== undefined ? { opacity: i.opacity } : {}),
          };
          return i.closed ? <Polygon key={k} {...props} /> : <Polyline key={k} {...props} />;
        }
        if (i.t === 'circle') return <Circle key={k} cx={i.x} cy={i.y} r={i.r} fill={i.fill ?? 'none'} stroke={i.stroke ?? 'none'} strokeWidth={i.width} />;
        return (
          <SvgText key={k} x={i.x} y={i.y} fill={i.colour} textAnchor={i.anchor} style={{ fontFamily: PDF_FONT, fontSize: i.size, fontWeight: i.bold ? 700 : 400 }}>
            {i.text}
          </SvgText>
        );
      })}
    </Svg>
  );
}
