'use client';
import type { LiftResult, SlewSnapshot } from '@/lib/lift';
import type { UnitSystem } from '@/lib/units';
import { formatAngle, formatForce, formatPressure } from '@/lib/format/quantity';

/** Pad reactions: the most each pad carries over the swing, and what it carries at the slew on screen. */
export function PadTable({ result, snapshot, units, allowable }: { result: LiftResult; snapshot: SlewSnapshot | null; units: UnitSystem; allowable: number }) {
  const crib = (id: string) => result.reactions.atWorstCase.find((r) => r.support === id)?.pressureWithCribbing !== null;
  return (
    <section className="mt-4">
      <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-muted">Pads and ground</h3>
      <div className="overflow-x-auto">
        <table className="w-full text-sm tabular-nums" data-testid="pad-table">
          <thead>
            <tr className="border-b border-paper-line text-left text-xs text-ink-soft">
              <th className="py-1 pr-2">Pad</th>
              <th className="py-1 pr-2">Now</th>
              <th className="py-1 pr-2">Most (at slew)</th>
              <th className="py-1 pr-2">Ground pressure</th>
              <th className="py-1">vs allowable</th>
            </tr>
          </thead>
          <tbody>
            {result.reactions.maxima.map((m) => {
              const now = snapshot?.reactions.find((r) => r.support === m.support);
              const ok = m.pressure <= allowable;
              return (
                <tr key={m.support} className="border-b border-paper-line">
                  <td className="whitespace-nowrap py-1 pr-2 font-semibold">
                    {m.name}
                    <span className="block text-[11px] font-normal text-ink-muted">{crib(m.support) ? 'on cribbing' : 'pad only'}</span>
                  </td>
                  <td className="py-1 pr-2">{now ? (now.inContact ? formatForce(now.force, units) : 'lifts off') : '—'}</td>
                  <td className="py-1 pr-2">
                    {formatForce(m.force, units)} ({formatAngle(m.slew, 0)}){m.liftsOff && <span className="block text-[11px] text-over">lifts off somewhere on the swing</span>}
                  </td>
                  <td className="py-1 pr-2">{formatPressure(m.pressure, units)}</td>
                  <td className={`py-1 font-semibold ${ok ? 'text-within' : 'text-over'}`}>
                    {ok ? '✓ within' : '✗ OVER'} {formatPressure(allowable, units)}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="mt-1 text-xs text-ink-muted">Pressure over the cribbing where there is cribbing (its own weight included), otherwise over the pad.</p>
    </section>
  );
}
