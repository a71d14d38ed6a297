'use client';
import { useEffect, useState } from 'react';
import type { LoadObject, RiggingPick } from '../../document/objects';
import { useEditorContext, useEditorState } from '../../editor-context';
import { updateObject } from '../../commands/objects';
import { formatMass } from '@/lib/units';
import { NumberField, SelectField } from '../fields';

interface InventoryItem {
  id: number;
  tag: string;
  kind: string;
  size?: string | null;
  ratings: { vertical?: number | null; choker?: number | null; basket?: number | null };
  nextInspectionDue?: string | null;
  status: string;
}

/** Rigging from the inventory (in-service items only); ratings are copied into the plan. */
export function RiggingPicker({ load }: { load: LoadObject }) {
  const { store } = useEditorContext();
  const units = useEditorState((s) => s.units);
  const ro = useEditorState((s) => s.readOnly) || load.locked;
  const [items, setItems] = useState<InventoryItem[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [pick, setPick] = useState('');
  useEffect(() => {
    if (ro) return;
    fetch('/api/rigging?status=in_service')
      .then(async (r) => (r.ok ? r.json() : Promise.reject(new Error(`${r.status}`))))
      .then((d: { items?: InventoryItem[] } | InventoryItem[]) => setItems(Array.isArray(d) ? d : (d.items ?? [])))
      .catch(() => setError('The rigging inventory could not be loaded.'));
  }, [ro]);
  const set = (rigging: RiggingPick[]) => store.getState().run(updateObject(load.id, { rigging }));
  const today = new Date().toISOString().slice(0, 10);
  return (
    <section className="mb-4">
      <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-muted">Rigging</h3>
      {load.rigging.length === 0 && <p className="mb-2 text-sm text-ink-muted">No rigging picked yet.</p>}
      <ul className="space-y-2">
        {load.rigging.map((r, i) => (
          <li key={i} className="rounded-md border border-paper-line p-2 text-sm">
            <div className="flex items-center justify-between">
              <span className="font-semibold">
                {r.tag} · {r.kind}
              </span>
              {!ro && (
                <button type="button" className="min-h-11 px-2 text-over" onClick={() => set(load.rigging.filter((_, j) => j !== i))}>
                  Remove
                </button>
              )}
            </div>
            <div className="grid grid-cols-3 gap-2">
              <SelectField label="Hitch" value={r.hitch} disabled={ro} options={[{ value: 'vertical', label: 'Vertical' }, { value: 'choker', label: 'Choker' }, { value: 'basket', label: 'Basket' }]} onCommit={(hitch) => set(load.rigging.map((q, j) => (j === i ? { ...q, hitch, ratingKg: q.ratings?.[hitch] ?? q.ratingKg } : q)))} />
              <NumberField label="Legs" value={r.legs} min={1} max={8} digits={0} disabled={ro} onCommit={(legs) => set(load.rigging.map((q, j) => (j === i ? { ...q, legs: Math.round(legs) } : q)))} />
              <NumberField label="Angle (° up)" value={r.angleFromHorizontal} min={1} max={90} disabled={ro} onCommit={(a) => set(load.rigging.map((q, j) => (j === i ? { ...q, angleFromHorizontal: a } : q)))} />
            </div>
            <p className="mt-1 text-xs text-ink-muted">Rated {formatMass(r.ratingKg, units)} in this hitch</p>
          </li>
        ))}
      </ul>
      {!ro && (
        <div className="mt-2 flex items-end gap-2">
          {error && <p className="text-sm text-over">{error}</p>}
          {items && (
            <>
              <div className="flex-1">
                <SelectField
                  label="Add from the inventory"
                  value={pick}
                  onCommit={setPick}
                  options={[
                    { value: '', label: items.length ? 'Choose an item…' : 'No in-service items' },
                    ...items.map((it) => ({
                      value: String(it.id),
                      label: `${it.tag} · ${it.kind}${it.size ? ` ${it.size}` : ''}${it.nextInspectionDue && it.nextInspectionDue < today ? ' · INSPECTION OVERDUE' : ''}`,
                    })),
                  ]}
                />
              </div>
              <button
                type="button"
                disabled={!pick}
                className="min-h-11 rounded-md bg-teal px-3 text-sm font-semibold text-white disabled:opacity-40"
                onClick={() => {
                  const it = items.find((q) => String(q.id) === pick);
                  if (!it || it.status !== 'in_service') return;
                  const rating = it.ratings.vertical ?? it.ratings.basket ?? it.ratings.choker ?? 0;
                  if (!(rating > 0)) return;
                  set([...load.rigging, { itemId: it.id, tag: it.tag, kind: it.kind, hitch: 'vertical', legs: 1, angleFromHorizontal: 90, ratingKg: rating, ratings: { vertical: it.ratings.vertical ?? null, choker: it.ratings.choker ?? null, basket: it.ratings.basket ?? null }, massKg: 0 }]);
                  setPick('');
                }}
              >
                Add
              </button>
            </>
          )}
        </div>
      )}
    </section>
  );
}
