'use client';

import type { TruckSpec } from '@/lib/equipment/truck-spec';
import { type UnitSystem } from '@/lib/units';
import { formatLength } from '@/lib/format/quantity';
import { padName } from '@/lib/lift/names';

/**
 * A to-scale plan and side view drawn straight from the profile's numbers (carrier frame: x forward from
 * the tailboard's rear edge, y left). It tolerates half-typed values: anything not a finite number is skipped.
 */
type DeepPartial<T> = { [K in keyof T]?: T[K] extends object ? DeepPartial<T[K]> | null : T[K] };
export type DraftSpec = DeepPartial<TruckSpec>;

const ok = (...v: unknown[]) => v.every((x) => typeof x === 'number' && Number.isFinite(x));
const PARTS = [
  { id: 'tailboard', label: 'Tailboard', fill: '#D6CFC2' },
  { id: 'body', label: 'Body', fill: '#ECE7DD' },
  { id: 'cab', label: 'Cab', fill: '#D5ECEE' },
] as const;

function extent(spec: DraftSpec) {
  const xs: number[] = [0];
  const ys: number[] = [0];
  const c = spec.carrier;
  if (c && ok(c.length, c.width)) {
    xs.push(c.length!);
    ys.push(c.width! / 2, -c.width! / 2);
  }
  for (const leg of spec.outriggers?.legs ?? []) {
    if (!leg || !ok(leg.mount?.x, leg.mount?.y, leg.direction, leg.stages?.full)) continue;
    const a = (leg.direction! * Math.PI) / 180;
    xs.push(leg.mount!.x! + leg.stages!.full! * Math.cos(a) + 0.5, leg.mount!.x! + leg.stages!.full! * Math.cos(a) - 0.5);
    ys.push(leg.mount!.y! + leg.stages!.full! * Math.sin(a) + 0.5, leg.mount!.y! + leg.stages!.full! * Math.sin(a) - 0.5);
  }
  // Bands above and below the plan hold the title, the scale bar and the overall length clear of the pad codes.
  return { minX: Math.min(...xs) - 0.8, maxX: Math.max(...xs) + 0.8, minY: Math.min(...ys) - 1.4, maxY: Math.max(...ys) + 1.1 };
}

function ScaleBar({ x, y, units }: { x: number; y: number; units: UnitSystem }) {
  const len = units === 'metric' ? 2 : 3.048; // 2 m or 10 ft
  return (
    <g>
      <rect x={x} y={y} width={len / 2} height={0.12} fill="#15202B" />
      <rect x={x + len / 2} y={y} width={len / 2} height={0.12} fill="#fff" stroke="#15202B" strokeWidth={0.03} />
      <text x={x} y={y + 0.5} fontSize={0.34} fill="#15202B">
        {units === 'metric' ? '0 — 2 m' : '0 — 10 ft'}
      </text>
    </g>
  );
}

export function ProfileDrawing({ spec, units }: { spec: DraftSpec; units: UnitSystem }) {
  const e = extent(spec);
  const c = spec.carrier ?? {};
  const slew = spec.upper?.slewAxis;
  const pivot = spec.boom?.pivot;
  const firstStage = spec.boom?.stages?.[0]?.length;
  const w = e.maxX - e.minX;
  const planH = e.maxY - e.minY;
  const sideTop = Math.max(4, ...(PARTS.map((p) => c[p.id]?.top ?? 0).filter((v) => ok(v)) as number[]), ok(c.stowedHeight) ? c.stowedHeight! : 0) + 0.8;
  const sideY0 = planH + 0.9 + sideTop; // ground line of the side view, in drawing units below the plan
  const totalH = sideY0 + 1.1;
  // The pads are labelled by their codes on the drawing; the key names each one (front/rear of the slew axis).
  const axisX = ok(slew?.x) ? slew!.x! : 0;
  const keyed = (spec.outriggers?.legs ?? []).filter((l) => l?.id && ok(l.mount?.x, l.mount?.y));
  const padKey = keyed.length ? `Pads: ${keyed.map((l) => `${l!.id} ${padName(l!.id!, l!.mount!.x! - axisX, l!.mount!.y!)}`).join(' · ')}` : null;
  const lengthText = ok(c.length) ? formatLength(c.length!, units) : '—';
  return (
    <figure className="rounded-plate border border-paper-line bg-paper-raised p-2" data-testid="profile-drawing">
      <svg viewBox={`${e.minX} ${-e.maxY} ${w} ${totalH}`} className="h-auto w-full" role="img" aria-label={`Plan and side view, overall length ${lengthText}`}>
        <text x={e.minX + 0.2} y={-e.maxY + 0.45} fontSize={0.36} fontWeight={700} fill="#0F5C63">
          PLAN (from above, cab to the right)
        </text>
        {PARTS.map((p) => {
          const part = c[p.id];
          if (!part || !ok(part.rear, part.front, part.width)) return null;
          return (
            <g key={p.id}>
              <rect x={part.rear} y={-part.width! / 2} width={Math.max(0, part.front! - part.rear!)} height={part.width} fill={p.fill} stroke="#15202B" strokeWidth={0.04} />
              <text x={(part.rear! + part.front!) / 2} y={0.12} fontSize={0.3} textAnchor="middle" fill="#15202B">
                {p.label}
              </text>
            </g>
          );
        })}
        {(spec.outriggers?.legs ?? []).map((leg, i) => {
          if (!leg || !ok(leg.mount?.x, leg.mount?.y, leg.direction, leg.stages?.full, leg.stages?.retracted)) return null;
          const a = (leg.direction! * Math.PI) / 180;
          const at = (r: number) => ({ x: leg.mount!.x! + r * Math.cos(a), y: -(leg.mount!.y! + r * Math.sin(a)) });
          const full = at(leg.stages!.full!);
          const ret = at(leg.stages!.retracted!);
          const pl = ok(leg.pad?.length) ? leg.pad!.length! : 0.6;
          const pw = ok(leg.pad?.width) ? leg.pad!.width! : 0.6;
          return (
            <g key={i} data-leg={leg.id}>
              <line x1={leg.mount!.x} y1={-leg.mount!.y!} x2={full.x} y2={full.y} stroke="#0F5C63" strokeWidth={0.1} />
              <rect x={ret.x - pl / 2} y={ret.y - pw / 2} width={pl} height={pw} fill="none" stroke="#0F5C63" strokeWidth={0.04} strokeDasharray="0.1 0.08" />
              <rect x={full.x - pl / 2} y={full.y - pw / 2} width={pl} height={pw} fill="#F2A900" stroke="#15202B" strokeWidth={0.05} />
              <text x={full.x} y={full.y + (full.y > 0 ? pw / 2 + 0.4 : -pw / 2 - 0.15)} fontSize={0.32} textAnchor="middle" fontWeight={700} fill="#15202B">
                {leg.id}
              </text>
            </g>
          );
        })}
        {slew && ok(slew.x, slew.y) && (
          <g>
            {pivot && ok(pivot.x) && ok(firstStage) && <line x1={slew.x! + pivot.x!} y1={-slew.y!} x2={slew.x! + pivot.x! + firstStage!} y2={-slew.y!} stroke="#15202B" strokeWidth={0.22} strokeLinecap="round" opacity={0.75} />}
            <circle cx={slew.x} cy={-slew.y!} r={0.22} fill="#fff" stroke="#15202B" strokeWidth={0.06} />
            <path d={`M ${slew.x! - 0.3} ${-slew.y!} h 0.6 M ${slew.x} ${-slew.y! - 0.3} v 0.6`} stroke="#15202B" strokeWidth={0.04} />
          </g>
        )}
        {ok(c.cg?.x, c.cg?.y) && <circle cx={c.cg!.x} cy={-c.cg!.y!} r={0.16} fill="#15202B" aria-label="carrier CG" />}
        <ScaleBar x={e.minX + 0.3} y={-e.minY - 0.6} units={units} />
        <text x={e.maxX - 0.2} y={-e.minY - 0.2} fontSize={0.34} textAnchor="end" fill="#15202B" data-testid="drawing-length">
          Overall length {lengthText}
        </text>

        <g transform={`translate(0 ${-e.maxY + sideY0})`}>
          <text x={e.minX + 0.2} y={-sideTop + 0.35} fontSize={0.36} fontWeight={700} fill="#0F5C63">
            SIDE VIEW (left side)
          </text>
          <line x1={e.minX} y1={0} x2={e.maxX} y2={0} stroke="#5F6E7C" strokeWidth={0.05} />
          {PARTS.map((p) => {
            const part = c[p.id];
            if (!part || !ok(part.rear, part.front, part.top)) return null;
            const bottom = p.id === 'cab' ? 0.5 : 0.9;
            return <rect key={p.id} x={part.rear} y={-part.top!} width={Math.max(0, part.front! - part.rear!)} height={Math.max(0, part.top! - bottom)} fill={p.fill} stroke="#15202B" strokeWidth={0.04} />;
          })}
          {slew && pivot && ok(slew.x, pivot.x, pivot.z) && (
            <g>
              {ok(firstStage) && (
                <line
                  x1={slew.x! + pivot.x!}
                  y1={-pivot.z!}
                  x2={slew.x! + pivot.x! + firstStage! * Math.cos(((spec.carrier?.boomStowed?.elevation ?? 0) * Math.PI) / 180)}
                  y2={-pivot.z! - firstStage! * Math.sin(((spec.carrier?.boomStowed?.elevation ?? 0) * Math.PI) / 180)}
                  stroke="#15202B"
                  strokeWidth={0.3}
                  strokeLinecap="round"
                />
              )}
              <circle cx={slew.x! + pivot.x!} cy={-pivot.z!} r={0.14} fill="#F2A900" stroke="#15202B" strokeWidth={0.04} />
            </g>
          )}
          {ok(c.stowedHeight) && (
            <g>
              <line x1={e.minX} y1={-c.stowedHeight!} x2={e.maxX} y2={-c.stowedHeight!} stroke="#B3261E" strokeWidth={0.03} strokeDasharray="0.2 0.12" />
              <text x={e.maxX - 0.2} y={-c.stowedHeight! - 0.1} fontSize={0.3} textAnchor="end" fill="#B3261E">
                stowed height {formatLength(c.stowedHeight!, units)}
              </text>
            </g>
          )}
        </g>
      </svg>
      <figcaption className="px-1 pt-1 text-caption text-ink-muted">
        Drawn to scale from the numbers in the form. Amber squares: pads at full reach; dashed: retracted.
        {padKey && (
          <span className="block" data-testid="drawing-pad-key">
            {padKey}
          </span>
        )}
      </figcaption>
    </figure>
  );
}
