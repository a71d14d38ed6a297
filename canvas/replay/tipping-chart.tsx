'use client';
import type { SweepSample } from '@/lib/lift';
import type { Arc } from '@/lib/replay/playback-clock';
import { travelOf } from '@/lib/replay/playback-clock';

const W = 600;
const H = 200;
const PAD = { l: 44, r: 12, t: 12, b: 28 };

/**
 * % of tipping against slew over the planned swing (the engine's sweep), with the plan's limit and a
 * cursor at the slew shown. The x axis runs from pick to set, whichever way the boom turns.
 */
export function TippingChart({ sweep, arc, travel, limit, worstSlew, dark = false }: { sweep: SweepSample[]; arc: Arc; travel: number; limit: number; worstSlew: number | null; dark?: boolean }) {
  const span = Math.max(arc.span, 1e-9);
  const top = Math.max(100, limit, ...sweep.map((s) => s.percentOfTipping));
  const x = (t: number) => PAD.l + (t / span) * (W - PAD.l - PAD.r);
  const y = (pct: number) => PAD.t + (1 - Math.max(0, pct) / top) * (H - PAD.t - PAD.b);
  const pts = sweep.map((s) => `${x(travelOf(arc, s.slew) ?? 0).toFixed(1)},${y(s.percentOfTipping).toFixed(1)}`).join(' ');
  const ink = dark ? '#F7F4EE' : '#15202B';
  const soft = dark ? '#9FB0BF' : '#5F6E7C';
  const worstT = worstSlew === null ? null : travelOf(arc, worstSlew);
  const tick = (t: number) => Math.round(((arc.from + arc.sign * t) % 360 + 360) % 360);
  return (
    <svg viewBox={`0 0 ${W} ${H}`} className="h-auto w-full" role="img" aria-label="Percent of tipping against slew over the planned swing" data-testid="tipping-chart">
      <rect x={PAD.l} y={PAD.t} width={W - PAD.l - PAD.r} height={H - PAD.t - PAD.b} fill="none" stroke={soft} strokeWidth={1} />
      {[0, 50, 100].map((p) => (
        <g key={p}>
          <line x1={PAD.l} x2={W - PAD.r} y1={y(p)} y2={y(p)} stroke={soft} strokeWidth={0.5} strokeDasharray="2 4" />
          <text x={PAD.l - 6} y={y(p) + 4} textAnchor="end" fontSize={12} fill={soft}>
            {p} %
          </text>
        </g>
      ))}
      <line x1={PAD.l} x2={W - PAD.r} y1={y(limit)} y2={y(limit)} stroke="#B3261E" strokeWidth={1.5} strokeDasharray="8 5" />
      <text x={W - PAD.r - 4} y={y(limit) - 5} textAnchor="end" fontSize={12} fill={dark ? '#FF8A80' : '#B3261E'}>
        plan limit {limit} %
      </text>
      <polyline points={pts} fill="none" stroke={dark ? '#F2A900' : '#0F5C63'} strokeWidth={2.5} />
      {worstT !== null && <circle cx={x(worstT)} cy={y(sweep.reduce((m, s) => Math.max(m, s.percentOfTipping), 0))} r={4} fill={ink} />}
      {[0, span / 2, span].map((t) => (
        <text key={t} x={x(t)} y={H - 8} textAnchor={t === 0 ? 'start' : t === span ? 'end' : 'middle'} fontSize={12} fill={soft}>
          {t === 0 ? 'pick ' : t === span ? 'set ' : ''}
          {tick(t)}°
        </text>
      ))}
      <line data-testid="chart-cursor" x1={x(travel)} x2={x(travel)} y1={PAD.t} y2={H - PAD.b} stroke={ink} strokeWidth={2} />
    </svg>
  );
}
