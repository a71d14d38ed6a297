'use client';
import { wrap360 } from '@/lib/angles';
import type { LiftResult } from '@/lib/lift';
import { formatAngle, formatPercent } from '@/lib/format/quantity';

/** Percent of tipping against slew over the planned swing, with the plan's limit and the worst case. Hand-drawn SVG. */
export function TippingChart({ result, limit, slewNow, from, direction }: { result: LiftResult; limit: number; slewNow: number | null; from: number; direction: 'ccw' | 'cw' }) {
  const W = 340;
  const H = 170;
  const L = 36;
  const B = 26;
  const sweep = result.sweep;
  if (sweep.length < 2) return null;
  // Plot against distance along the swing from the pick, so a swing through 0° stays continuous.
  const along = (slew: number) => {
    const d = direction === 'ccw' ? slew - from : from - slew;
    return wrap360(d);
  };
  const xs: number[] = [];
  sweep.forEach((s, i) => {
    let t = along(s.slew);
    if (i > 0 && t < xs[i - 1] - 1e-6) t += 360;
    xs.push(t);
  });
  const span = Math.max(...xs, 1);
  const maxY = Math.max(100, limit, ...sweep.map((s) => s.percentOfTipping)) * 1.05;
  const x = (t: number) => L + (t / span) * (W - L - 8);
  const y = (v: number) => 8 + (1 - v / maxY) * (H - B - 8);
  const path = sweep.map((s, i) => `${i ? 'L' : 'M'}${x(xs[i]).toFixed(1)},${y(s.percentOfTipping).toFixed(1)}`).join('');
  const wa = along(result.worstCase.slew);
  const wx = x(wa > span + 1e-6 ? 0 : wa);
  const wy = y(result.worstCase.percentOfTipping);
  const ticks = [0, 0.25, 0.5, 0.75, 1].map((f) => f * span);
  const slewLabel = (t: number) => Math.round(wrap360(from + (direction === 'ccw' ? t : -t)));
  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full" role="img" aria-label={`Percent of tipping over the swing; worst case ${formatPercent(result.worstCase.percentOfTipping)} at ${formatAngle(result.worstCase.slew)}`} data-testid="tipping-chart">
        <rect x={L} y={8} width={W - L - 8} height={H - B - 8} fill="#FFFFFF" stroke="#D6CFC2" />
        {[0, 25, 50, 75, 100].filter((v) => v <= maxY).map((v) => (
          <g key={v}>
            <line x1={L} x2={W - 8} y1={y(v)} y2={y(v)} stroke="#ECE7DD" />
            <text x={L - 4} y={y(v) + 4} fontSize="10" textAnchor="end" fill="#5F6E7C">
              {v}
            </text>
          </g>
        ))}
        {ticks.map((t, i) => (
          <text key={t} x={x(t)} y={H - 10} fontSize="10" textAnchor={i === ticks.length - 1 ? 'end' : 'middle'} fill="#5F6E7C">
            {slewLabel(t)}°
          </text>
        ))}
        <line x1={L} x2={W - 8} y1={y(limit)} y2={y(limit)} stroke="#B3261E" strokeWidth="2" strokeDasharray="8 5" />
        <text x={W - 10} y={y(limit) - 4} fontSize="10" textAnchor="end" fill="#B3261E" fontWeight="600">
          limit {limit} %
        </text>
        <path d={path} fill="none" stroke="#0F5C63" strokeWidth="2.5" />
        {slewNow !== null && along(slewNow) <= span && <line x1={x(along(slewNow))} x2={x(along(slewNow))} y1={8} y2={H - B} stroke="#F2A900" strokeWidth="2" />}
        <circle cx={wx} cy={wy} r="5" fill="#15202B" />
        <text x={Math.min(wx + 6, W - 100)} y={Math.max(wy - 6, 18)} fontSize="10" fontWeight="700" fill="#15202B">
          worst {formatPercent(result.worstCase.percentOfTipping)}
        </text>
      </svg>
      <figcaption className="text-xs text-ink-muted">Percent of tipping (up) against slew from pick to set (across); dashed red: the plan’s limit; dot: worst case; amber: now.</figcaption>
    </figure>
  );
}
