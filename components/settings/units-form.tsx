'use client';

import { useMutation } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useLeaveGuard } from '@/components/use-leave-guard';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { Notice } from '@/components/ui/notice';
import { fetchJson } from '@/lib/client/fetch-json';
import { type UnitSystem } from '@/lib/units';
import { formatLength, formatMass, formatPressure } from '@/lib/format/quantity';

// Sample values to show what each choice looks like: a 12.5 m radius, a 9,000 kg load, 150 kPa under a pad.
const SAMPLE = { radius: 12.5, mass: 9000, pressure: 150 };

const OPTIONS: { value: UnitSystem; title: string; sub: string }[] = [
  { value: 'imperial', title: 'Feet-inches and pounds', sub: 'The default' },
  { value: 'metric', title: 'Metres and kilograms', sub: 'Metric' },
];

export function UnitsForm({ current }: { current: UnitSystem }) {
  const router = useRouter();
  const [choice, setChoice] = useState<UnitSystem>(current);
  const [saved, setSaved] = useState<UnitSystem | null>(null);
  const save = useMutation({
    mutationFn: (units: UnitSystem) => fetchJson<{ units: UnitSystem }>('/api/me', { method: 'PATCH', body: JSON.stringify({ units }) }),
    onSuccess: (me) => {
      setSaved(me.units);
      router.refresh();
    },
  });
  useLeaveGuard(choice !== (saved ?? current) && !save.isPending);

  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        setSaved(null);
        save.mutate(choice);
      }}
      className="flex flex-col gap-5"
    >
      <fieldset>
        <legend className="text-label text-ink">Units shown on plans and results</legend>
        <div className="mt-3 grid gap-4 md:grid-cols-2">
          {OPTIONS.map((o) => {
            const on = choice === o.value;
            return (
              <label
                key={o.value}
                className={cx(
                  'flex cursor-pointer gap-3 rounded-plate border-2 bg-paper-raised p-4 shadow-plate',
                  on ? 'border-ink outline outline-2 outline-signal' : 'border-paper-edge hover:border-ink-soft',
                )}
              >
                <input type="radio" name="units" value={o.value} checked={on} onChange={() => setChoice(o.value)} className="mt-1 h-6 w-6 shrink-0 accent-teal" />
                <span className="min-w-0">
                  <span className="block text-lead font-bold">{o.title}</span>
                  <span className="block text-caption font-semibold uppercase tracking-[0.1em] text-teal">{o.sub}</span>
                  <span className="mt-2 block text-body text-ink-soft">
                    Radius <strong className="text-ink">{formatLength(SAMPLE.radius, o.value)}</strong> · load <strong className="text-ink">{formatMass(SAMPLE.mass, o.value)}</strong> · pad{' '}
                    <strong className="text-ink">{formatPressure(SAMPLE.pressure, o.value)}</strong>
                  </span>
                </span>
              </label>
            );
          })}
        </div>
      </fieldset>
      <p className="text-caption text-ink-muted">Arcline stores and computes everything in SI units; this only changes how figures are shown and typed.</p>
      {saved && <Notice tone="success" title="Units saved">Figures now show in {saved === 'metric' ? 'metres and kilograms' : 'feet-inches and pounds'}.</Notice>}
      {save.isError && (
        <Notice tone="error" title="Not saved">
          {save.error.message}
        </Notice>
      )}
      <div>
        <Button type="submit" variant="primary" disabled={save.isPending || choice === current}>
          {save.isPending ? 'Saving…' : 'Save units'}
        </Button>
      </div>
    </form>
  );
}
