import { Line, Polyline, Svg, Text as SvgText, Circle } from '@react-pdf/renderer';
import type { LiftResult } from '@/lib/lift';
import { PDF_FONT } from './fonts';
import { INK, MUTED, OVER, RULE } from './styles';

/** Percent of tipping against slew along the planned swing (pick on the left), with the limit and the worst case. */
export function StabilityChart({ r, limit, width = 520, height = 170 }: { r: LiftResult; limit: number; width?: number; height?: number }) {
  const left = 34;
  const bottom = 22;
  const w = width - left - 8;
  const h = height - bottom - 10;
  const n = r.sweep.length;
  const top = Math.max(100, Math.ceil(Math.max(limit, ...r.sweep.map((p) => p.percentOfTipping)) / 20) * 20);
  const x = (k: number) => left + (n > 1 ? (k / (n - 1)) * w : w / 2);
  const y = (v: number) => 10 + h - (Math.max(0, v) / top) * h;
  const worstK = r.sweep.reduce((b, p, k) => (Math.abs(p.slew - r.worstCase.slew) < Math.abs(r.sweep[b].slew - r.worstCase.slew) ? k : b), 0);
  const font = { fontFamily: PDF_FONT, fontSize: 6.5 };
  const ticks = Array.from({ length: top / 20 + 1 }, (_, i) => i * 20);
  const slewTicks = n > 1 ? [0, Math.round((n - 1) / 4), Math.round((n - 1) / 2), Math.round((3 * (n - 1)) / 4), n - 1] : [0];
  return (
    <Svg width={width} height={height}>
      {ticks.map((t) => (
        <Line key={t} x1={left} x2={left + w} y1={y(t)} y2={y(t)} stroke={RULE} strokeWidth={0.4} />
      ))}
      {ticks.map((t) => (
        <SvgText key={`l${t}`} x={left - 4} y={y(t) + 2} textAnchor="end" fill={MUTED} style={font}>
          {`${t} %`}
        </SvgText>
      ))}
      {slewTicks.map((k) => (
        <SvgText key={`s${k}`} x={x(k)} y={height - 8} textAnchor="middle" fill={MUTED} style={font}>
          {`${r.sweep[k].slew.toFixed(0)}°`}
        </SvgText>
      ))}
      <SvgText x={left + w / 2} y={height - 1} textAnchor="middle" fill={MUTED} style={font}>
        slew along the planned swing, pick to set
      </SvgText>
      <Line x1={left} x2={left + w} y1={y(limit)} y2={y(limit)} stroke={OVER} strokeWidth={0.8} strokeDasharray="4 2" />
      <SvgText x={left + w - 2} y={y(limit) - 3} textAnchor="end" fill={OVER} style={font}>
        {`plan limit ${limit} %`}
      </SvgText>
      <Polyline points={r.sweep.map((p, k) => `${x(k).toFixed(2)},${y(p.percentOfTipping).toFixed(2)}`).join(' ')} fill="none" stroke={INK} strokeWidth={1.2} />
      <Circle cx={x(worstK)} cy={y(r.worstCase.percentOfTipping)} r={2.6} fill={OVER} />
      <SvgText x={x(worstK) + (worstK > n / 2 ? -5 : 5)} y={y(r.worstCase.percentOfTipping) - 5} textAnchor={worstK > n / 2 ? 'end' : 'start'} fill={OVER} style={{ ...font, fontWeight: 700 }}>
        {`worst ${r.worstCase.percentOfTipping.toFixed(1)} % at ${r.worstCase.slew.toFixed(1)}°, line ${r.worstCase.line}`}
      </SvgText>
    </Svg>
  );
}
