'use client';
import { CAUTION_LINES } from '@/lib/caution';
import type { LiftResult } from '@/lib/lift';
import { formatMass, formatPercent } from '@/lib/format/quantity';
import { bandWords, changeWords, limitsInOrder, sensitivityHeadline, weightLimitFigure, weightLimitTitle } from '@/lib/format/weight-sensitivity';
import type { UnitSystem } from '@/lib/units';

const SERIES = [
  { key: 'tipping', label: 'tipping', colour: '#0F5C63', dash: '' },
  { key: 'chart', label: 'load chart', colour: '#6B4FA0', dash: '6 3' },
  { key: 'pad', label: 'highest pad', colour: '#8A5A12', dash: '2 3' },
] as const;

/** The three figures over the weight band, each as a share of its own limit (100 % = the limit). */
function BandChart({ r, tippingLimit, chartLimit, allowable }: { r: LiftResult; tippingLimit: number; chartLimit: number; allowable: number }) {
  const ws = r.weightSensitivity!;
  const c = ws.curve;
  if (c.length < 2) return null;
  const W = 340, H = 150, L = 34, B = 24, T = 8, R = 8;
  const lo = c[0].change, hi = c[c.length - 1].change;
  const share = {
    tipping: c.map((p) => (100 * p.percentOfTipping) / tippingLimit),
    chart: c.map((p) => (p.loadChartPercent === null ? null : (100 * p.loadChartPercent) / chartLimit)),
    pad: c.map((p) => (100 * p.padPressure) / allowable),
  };
  const all = [...share.tipping, ...share.pad, ...share.chart.filter((v): v is number => v !== null)];
  const maxY = Math.max(110, ...all) * 1.05;
  const x = (ch: number) => L + ((ch - lo) / (hi - lo || 1)) * (W - L - R);
  const y = (v: number) => T + (1 - v / maxY) * (H - B - T);
  const path = (vs: (number | null)[]) => (vs.some((v) => v === null) ? '' : vs.map((v, i) => `${i ? 'L' : 'M'}${x(c[i].change).toFixed(1)},${y(v as number).toFixed(1)}`).join(''));
  const first = ws.first?.change ?? null;
  return (
    <figure className="mt-2">
      <svg viewBox={`0 0 ${W} ${H}`} className="w-full" role="img" aria-label="Share of each limit used as the load weight changes" data-testid="weight-band-chart">
        <rect x={L} y={T} width={W - L - R} height={H - B - T} fill="#FFFFFF" stroke="#D6CFC2" />
        {[0, 50, 100].map((v) => (
          <text key={v} x={L - 4} y={y(v) + 4} fontSize="10" textAnchor="end" fill="#5F6E7C">{v}</text>
        ))}
        <line x1={L} x2={W - R} y1={y(100)} y2={y(100)} stroke="#B3261E" strokeWidth="2" strokeDasharray="8 5" />
        <text x={W - R - 2} y={y(100) - 4} fontSize="10" textAnchor="end" fill="#B3261E" fontWeight="600">limit</text>
        {[lo, 0, hi].map((ch) => (
          <text key={ch} x={x(ch)} y={H - 8} fontSize="10" textAnchor={ch === lo ? 'start' : ch === hi ? 'end' : 'middle'} fill="#5F6E7C">{ch === 0 ? 'planned' : changeWords(ch)}</text>
        ))}
        <line x1={x(0)} x2={x(0)} y1={T} y2={H - B} stroke="#15202B" strokeDasharray="2 3" />
        {first !== null && first >= lo && first <= hi && <line x1={x(first)} x2={x(first)} y1={T} y2={H - B} stroke="#B3261E" strokeWidth="1.5" />}
        {SERIES.map((s) => (
          <path key={s.key} d={path(share[s.key])} fill="none" stroke={s.colour} strokeWidth="2.5" strokeDasharray={s.dash} />
        ))}
      </svg>
      <figcaption className="text-xs text-ink-muted">
        Share of each limit used (up) against the load’s weight (across):{' '}
        {SERIES.filter((s) => s.key !== 'chart' || share.chart.every((v) => v !== null)).map((s, i) => (
          <span key={s.key}>{i ? ', ' : ''}<span style={{ color: s.colour }} className="font-semibold">{s.label}</span></span>
        ))}
        ; red line: the first limit reached.
      </figcaption>
    </figure>
  );
}

/** "If the load weighs more": the weight at which each limit is reached, with the caution beside it. */
export function WeightSensitivityPanel({ r, units, tippingLimit, chartLimit, allowable }: { r: LiftResult; units: UnitSystem; tippingLimit: number; chartLimit: number; allowable: number }) {
  const ws = r.weightSensitivity;
  if (!ws) return null;
  const mass = (kg: number) => formatMass(kg, units);
  const reached = ws.first !== null && ws.first.loadMass !== null;
  const early = reached && (ws.first!.loadMass as number) <= ws.loadMass;
  const nominal = ws.curve.find((p) => p.change === 0);
  return (
    <section className="mt-3 rounded-md border border-paper-line bg-paper p-3" data-testid="weight-sensitivity">
      <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-muted">If the load weighs more</h3>
      <p className={`mt-1 text-sm font-semibold ${early ? 'text-over' : ''}`} data-testid="weight-headline">{sensitivityHeadline(ws, mass)}</p>
      <p className="mt-1 text-xs text-ink-soft" data-testid="weight-caution">{CAUTION_LINES[0]} {CAUTION_LINES[1]}</p>
      <p className="mt-1 text-xs text-ink-soft">Weights looked at: {bandWords(ws, mass)}{nominal ? ` At the planned weight: ${formatPercent(nominal.percentOfTipping)} of tipping.` : ''}</p>
      <BandChart r={r} tippingLimit={tippingLimit} chartLimit={chartLimit} allowable={allowable} />
      <details className="mt-2 text-xs">
        <summary className="cursor-pointer font-semibold">Weight at which each limit is reached</summary>
        <ul className="mt-1 space-y-0.5" data-testid="weight-limits">
          {limitsInOrder(ws).map((l) => (
            <li key={`${l.kind}:${l.check}`} className="flex justify-between gap-2">
              <span>{weightLimitTitle(l).replace(/^./, (c) => c.toUpperCase())}</span>
              <span className="shrink-0 text-right tabular-nums font-semibold">{weightLimitFigure(l, mass)}</span>
            </li>
          ))}
        </ul>
      </details>
    </section>
  );
}
