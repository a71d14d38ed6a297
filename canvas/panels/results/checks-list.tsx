'use client';
import type { Check, LiftResult } from '@/lib/lift';
import { formatLength, formatMass, formatPressure, type UnitSystem } from '@/lib/units';
import { checkSentence } from './check-sentence';

const GROUPS: { title: string; test: (id: string) => boolean }[] = [
  { title: 'Stability', test: (id) => id.startsWith('stability') || id.startsWith('tipping') },
  { title: 'Ground', test: (id) => id.startsWith('bearing') || id.startsWith('pad') },
  { title: 'Clearances', test: (id) => id.startsWith('clearance') },
  { title: 'Power lines', test: (id) => id.startsWith('power-line') },
  { title: 'Rigging', test: (id) => id.startsWith('rigging') || id.startsWith('sling') || id.startsWith('shackle') || id.startsWith('winch') },
  { title: 'Load chart', test: (id) => id.startsWith('load-chart') || id.startsWith('chart') },
];

function show(v: number | null, unit: Check['unit'], units: UnitSystem): string {
  if (v === null) return '—';
  if (unit === 'm') return formatLength(v, units);
  if (unit === 'kg') return formatMass(v, units);
  if (unit === 'kPa') return formatPressure(v, units);
  return `${v.toFixed(1)} %`;
}

/** Every check, grouped, each with value, limit, unit and the engine's sentence in the user's units. */
export function ChecksList({ result, units, names }: { result: LiftResult; units: UnitSystem; names: Record<string, string> }) {
  const used = new Set<string>();
  const sections = GROUPS.map((g) => {
    const items = result.checks.filter((c) => !used.has(c.id) && g.test(c.id));
    items.forEach((c) => used.add(c.id));
    return { title: g.title, items };
  });
  const rest = result.checks.filter((c) => !used.has(c.id));
  if (rest.length) sections.push({ title: 'Other', items: rest });
  const label = (id: string) => {
    const [, target] = id.split(':');
    return target && names[target] ? `${id.split(':')[0]}: ${names[target]}` : id;
  };
  return (
    <div className="mt-4 space-y-3" data-testid="checks">
      {sections
        .filter((s) => s.items.length)
        .map((s) => (
          <section key={s.title}>
            <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-ink-muted">{s.title}</h3>
            <ul className="space-y-1.5">
              {s.items.map((c) => (
                <li key={c.id} className={`rounded-md border-l-4 bg-paper p-2 text-sm ${c.ok ? 'border-within' : 'border-over bg-over-light'}`} data-testid={`check-${c.id}`} data-ok={c.ok}>
                  <div className="flex flex-wrap items-baseline justify-between gap-x-2">
                    <span className="font-semibold">
                      {c.ok ? '✓' : '✗'} {label(c.id)}
                    </span>
                    <span className="tabular-nums">
                      <span className="font-semibold">{show(c.value, c.unit, units)}</span> <span className="text-ink-muted">limit {show(c.limit, c.unit, units)}</span>{' '}
                      <span className={`font-bold ${c.ok ? 'text-within' : 'text-over'}`}>{c.ok ? 'within limit' : 'OVER LIMIT'}</span>
                    </span>
                  </div>
                  <p className="mt-0.5 text-xs text-ink-soft" data-testid={`check-sentence-${c.id}`}>{checkSentence(c, units)}</p>
                </li>
              ))}
            </ul>
          </section>
        ))}
    </div>
  );
}
