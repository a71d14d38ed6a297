'use client';

import { LocalDay } from '@/components/local-time';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select';
import { Badge } from '@/components/ui/badge';
import { fetchJson } from '@/lib/client/fetch-json';
import { useLeaveGuard } from '@/components/use-leave-guard';

interface Inspection {
  id: number;
  inspectedOn: string;
  result: 'pass' | 'fail';
  notes: string;
  nextDue: string | null;
  inspectorName: string;
}

/** Inspection history and, for operators and admins, a form to record one. A failed inspection tags the item out. */
export function InspectionsPanel({ itemId, items, canRecord, today }: { itemId: number; items: Inspection[]; canRecord: boolean; today: string }) {
  const router = useRouter();
  const [form, setForm] = useState({ inspectedOn: today, result: 'pass', nextDue: '', notes: '' });
  const [error, setError] = useState<string | null>(null);
  useLeaveGuard(canRecord && (form.inspectedOn !== today || form.result !== 'pass' || form.nextDue !== '' || form.notes.trim() !== ''));
  const submit = async () => {
    setError(null);
    try {
      await fetchJson(`/api/rigging/${itemId}/inspections`, { method: 'POST', body: JSON.stringify({ ...form, nextDue: form.nextDue || null }) });
      router.refresh();
    } catch (e) {
      setError(e instanceof Error ? e.message : 'Not saved');
    }
  };
  return (
    <section aria-labelledby="insp-title" className="space-y-3 rounded-plate border border-paper-line bg-paper-raised p-5 shadow-plate">
      <h2 id="insp-title" className="text-heading">
        Inspections
      </h2>
      {items.length === 0 ? (
        <p className="text-body text-ink-muted">No inspections recorded.</p>
      ) : (
        <ol className="divide-y divide-paper-line">
          {items.map((i) => (
            <li key={i.id} className="flex flex-wrap items-center gap-2 py-2 text-body">
              <span className="font-semibold"><LocalDay ymd={i.inspectedOn} /></span>
              {i.result === 'pass' ? <Badge tone="within" glyph="check">Passed</Badge> : <Badge tone="over" glyph="cross">Failed</Badge>}
              <span>{i.inspectorName}</span>
              {i.nextDue && <span className="text-ink-muted">next due <LocalDay ymd={i.nextDue} /></span>}
              {i.notes && <span className="w-full text-ink-soft">{i.notes}</span>}
            </li>
          ))}
        </ol>
      )}
      {canRecord && (
        <div className="space-y-3 border-t border-paper-line pt-3">
          <h3 className="text-label font-bold">Record an inspection</h3>
          <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
            <TextField type="date" label="Inspected on" value={form.inspectedOn} onChange={(e) => setForm({ ...form, inspectedOn: e.target.value })} />
            <SelectField label="Result" value={form.result} onChange={(e) => setForm({ ...form, result: e.target.value })}>
              <option value="pass">Passed</option>
              <option value="fail">Failed (tags the item out)</option>
            </SelectField>
            <TextField type="date" label="Next due" value={form.nextDue} onChange={(e) => setForm({ ...form, nextDue: e.target.value })} />
          </div>
          <TextField label="Notes" value={form.notes} onChange={(e) => setForm({ ...form, notes: e.target.value })} />
          <Button onClick={submit}>Record inspection</Button>
          {error && <Notice tone="error">{error}</Notice>}
        </div>
      )}
    </section>
  );
}
