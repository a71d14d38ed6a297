'use client';
import type { Check, CheckStatus } from '@/lib/lift';
import { describeCheck, groupChecks } from '@/lib/format/checks';
import type { UnitSystem } from '@/lib/units';

const TONE: Record<CheckStatus, { row: string; word: string; mark: string }> = {
  within: { row: 'border-within', word: 'text-within', mark: '✓' },
  near: { row: 'border-signal bg-signal-light', word: 'text-signal-dark', mark: '!' },
  beyond: { row: 'border-over bg-over-light', word: 'text-over', mark: '✗' },
};

function CheckRow({ check, units }: { check: Check; units: UnitSystem }) {
  const w = describeCheck(check, units);
  const tone = TONE[check.status];
  return (
    <li className={`rounded-md border-l-4 bg-paper p-2 text-sm ${tone.row}`} data-testid={`check-${check.id}`} data-ok={check.ok} data-status={check.status}>
      <div className="flex flex-wrap items-baseline justify-between gap-x-2">
        <span className="font-semibold">
          <span aria-hidden>{tone.mark}</span> {w.title}
        </span>
        <span className="tabular-nums">
          <span className="font-semibold" data-testid="check-value">{w.value}</span> <span className="text-ink-muted">{w.limit}</span>{' '}
          <span className={`font-bold ${tone.word}`}>{check.status === 'beyond' ? 'OVER LIMIT' : w.status}</span>
        </span>
      </div>
      <p className="mt-0.5 text-xs text-ink-soft" data-testid={`check-sentence-${check.id}`}>{w.sentence}</p>
    </li>
  );
}

/** Every check, grouped, each in words from the one check formatter (lib/format/checks.ts). */
export function ChecksList({ checks, units }: { checks: readonly Check[]; units: UnitSystem }) {
  return (
    <div className="mt-4 space-y-3" data-testid="checks">
      {groupChecks(checks).map((g) => (
        <section key={g.title}>
          <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-muted">{g.title}</h3>
          <ul className="space-y-1.5">
            {g.checks.map((c) => (
              <CheckRow key={c.id} check={c} units={units} />
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
