'use client';
import { formatDate } from '@/lib/format/date';
import { kindLabel } from '@/components/rigging/labels';
import { useState } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import type { LoadObject, RiggingPick } from '@/lib/scene/objects';
import { useEditorContext, useEditorState } from '../../editor-context';
import { updateObject } from '../../commands/objects';
import { loadMass } from '@/lib/scene/geometry/load';
import { fetchJson } from '@/lib/client/fetch-json';
import { SelectField } from '../fields';
import { Notice, RiggingPickRow } from './rigging-pick-row';
import { addVerdict, firstRating, isOverdue, pickNotices, type InventoryStatus, type RiggingNotice } from './rigging-status';

interface InventoryItem extends InventoryStatus {
  kind: string;
  size?: string | null;
}

const INVENTORY_KEY = ['rigging', 'editor-inventory'] as const;

/**
 * Rigging from the inventory; ratings are copied into the plan. Only in-service items are offered, each is
 * checked again against the inventory when added, and rows already in the plan say when an item has since
 * been tagged out, retired or gone past its inspection date.
 */
export function RiggingPicker({ load }: { load: LoadObject }) {
  const { store } = useEditorContext();
  const qc = useQueryClient();
  const units = useEditorState((s) => s.units);
  const ro = useEditorState((s) => s.readOnly) || load.locked;
  const [pick, setPick] = useState('');
  const [addNotice, setAddNotice] = useState<RiggingNotice | null>(null);
  const [adding, setAdding] = useState(false);
  // Every status, so rows in the plan can say what became of their item.
  const inventory = useQuery({ queryKey: INVENTORY_KEY, queryFn: () => fetchJson<{ items: InventoryItem[]; today: string }>('/api/rigging') });
  const items = inventory.data?.items ?? null;
  const today = inventory.data?.today ?? new Date().toISOString().slice(0, 10);
  const byId = new Map((items ?? []).map((it) => [it.id, it]));
  const offered = (items ?? []).filter((it) => it.status === 'in_service');
  const mass = loadMass(load);
  const hookLoad = mass + load.blockMassKg + load.rigging.reduce((a, r) => a + r.massKg, 0);
  const set = (rigging: RiggingPick[]) => store.getState().run(updateObject(load.id, { rigging }));

  async function add() {
    const id = Number(pick);
    setAddNotice(null);
    setAdding(true);
    try {
      // The list may be minutes old: the item's own record decides.
      const it = await qc.fetchQuery({ queryKey: ['rigging', 'item', id], queryFn: () => fetchJson<InventoryItem>(`/api/rigging/${id}`), staleTime: 0 });
      const verdict = addVerdict(it, today);
      if (!verdict.ok) {
        setAddNotice({ tone: 'stop', text: verdict.reason });
        void qc.invalidateQueries({ queryKey: INVENTORY_KEY });
        return;
      }
      const rating = firstRating(it)!;
      const rigging = store.getState().document.objects.find((o) => o.id === load.id);
      const current = rigging && rigging.kind === 'load' ? rigging.rigging : load.rigging;
      const ratings = { vertical: it.ratings.vertical ?? null, choker: it.ratings.choker ?? null, basket: it.ratings.basket ?? null };
      set([...current, { itemId: it.id, tag: it.tag, kind: it.kind, size: it.size ?? '', hitch: 'vertical', chokeAngle: null, bendRatio: null, lineAngle: null, legs: 1, angleFromHorizontal: 90, ratingKg: rating, ratings, massKg: 0 }]);
      setAddNotice(verdict.warning ? { tone: 'warn', text: verdict.warning } : null);
      setPick('');
    } catch {
      setAddNotice({ tone: 'stop', text: 'The item could not be checked against the inventory, so it was not added. Try again.' });
    } finally {
      setAdding(false);
    }
  }

  return (
    <section className="mb-4">
      <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-muted">Rigging</h3>
      {load.rigging.length === 0 && <p className="mb-2 text-sm text-ink-muted">No rigging picked yet.</p>}
      <ul className="space-y-2">
        {load.rigging.map((r, i) => (
          <RiggingPickRow
            key={i}
            pick={r}
            notices={items ? pickNotices(r, r.itemId === null ? undefined : byId.get(r.itemId), today) : []}
            loadMass={mass}
            hookLoad={hookLoad}
            units={units}
            readOnly={ro}
            onChange={(p) => set(load.rigging.map((q, j) => (j === i ? p : q)))}
            onRemove={() => set(load.rigging.filter((_, j) => j !== i))}
          />
        ))}
      </ul>
      {inventory.isError && <p className="mt-2 text-sm text-over">The rigging inventory could not be loaded, so the items’ current status cannot be shown.</p>}
      {!ro && items && (
        <div className="mt-2">
          <div className="flex items-end gap-2">
            <div className="min-w-0 flex-1">
              <SelectField
                label="Add from the inventory (in service)"
                value={pick}
                testId="rigging-add-select"
                onCommit={(v) => {
                  setPick(v);
                  setAddNotice(null);
                }}
                options={[
                  { value: '', label: offered.length ? 'Choose an item…' : 'No in-service items' },
                  ...offered.map((it) => ({
                    value: String(it.id),
                    label: `${it.tag} · ${kindLabel(it.kind)}${it.size ? ` ${it.size}` : ''}${it.notForLifting ? ' · not lifting rigging' : isOverdue(it, today) ? ` · inspection overdue since ${formatDate(it.nextInspectionDue!)}` : ''}`,
                  })),
                ]}
              />
            </div>
            <button type="button" disabled={!pick || adding} className="min-h-11 rounded-md bg-teal px-3 text-sm font-semibold text-white disabled:opacity-40" onClick={() => void add()}>
              Add
            </button>
          </div>
          {addNotice && <Notice notice={addNotice} testId="rigging-add-notice" />}
        </div>
      )}
    </section>
  );
}
