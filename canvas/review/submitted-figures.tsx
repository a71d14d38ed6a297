'use client';
import type { Check } from '@/lib/lift';
import type { PlanFigures } from '@/lib/review/figures';
import { figureLines, formatBreach } from '@/lib/review/format';
import { checksHeadline, describeCheck, groupChecks } from '@/lib/format/checks';
import type { UnitSystem } from '@/lib/units';
import { cx } from '@/components/ui/cx';

/** The server's figures and checks for the submitted revision, in words, beyond-limit checks first. */
export function SubmittedFigures({ figures, checks, units, engineVersion }: { figures: PlanFigures; checks: Check[]; units: UnitSystem; engineVersion: string | null }) {
  return (
    <section aria-label="Results" className="flex flex-col gap-3" data-testid="submitted-figures">
      <h2 className="text-heading font-bold">Results</h2>
      <p className="text-caption text-ink-soft">Computed by the server from the submitted revision{engineVersion ? ` (engine ${engineVersion})` : ''}, never by a browser.</p>
      <ul className="flex flex-col gap-1 text-body">
        {figureLines(figures, units).map((l) => (
          <li key={l}>{l}</li>
        ))}
      </ul>
      {figures.hardLimits.length > 0 && (
        <div className="rounded-plate border-2 border-over bg-over-light p-3">
          <p className="font-bold text-over">Beyond a hard limit</p>
          <ul className="list-disc pl-5 text-body">
            {figures.hardLimits.map((b) => (
              <li key={b.id}>{formatBreach(b, units)}</li>
            ))}
          </ul>
        </div>
      )}
      {checks.length > 0 && (
        <>
          <p className="font-semibold">{checksHeadline(checks)}</p>
          {groupChecks(checks).map((g) => (
            <div key={g.title}>
              <h3 className="text-caption font-bold uppercase tracking-wide text-ink-muted">{g.title}</h3>
              <ul className="mt-1 flex flex-col gap-1">
                {g.checks.map((c) => {
                  const w = describeCheck(c, units);
                  return (
                    <li key={c.id} className={cx('border-l-4 pl-2 text-body', c.status === 'beyond' ? 'border-over' : c.status === 'near' ? 'border-signal' : 'border-within')}>
                      <span className="font-semibold">{w.title}</span>: {w.sentence}
                    </li>
                  );
                })}
              </ul>
            </div>
          ))}
        </>
      )}
    </section>
  );
}
