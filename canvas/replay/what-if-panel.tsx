'use client';
import { useState } from 'react';
import { KG_PER_LB, M_PER_FT, type UnitSystem } from '@/lib/units';
import type { SceneDocument } from '@/lib/scene/schema';
import type { LoadObject, TruckObject } from '@/lib/scene/objects';
import { loadMass } from '@/lib/scene/geometry/load';
import type { WhatIf } from './what-if';

const field = 'min-h-touch w-24 rounded-plate border-2 border-ink bg-paper-raised px-2 tabular-nums';

/**
 * The sandbox: load mass, each outrigger's extension and cribbing, pick and set. Changes apply to a copy
 * in this page only; the saved scene and its revisions never change. A trainer may keep the variant as a
 * new training-set scene.
 */
export function WhatIfPanel({
  original, whatIf, onChange, units, onSave, saveState,
}: {
  original: SceneDocument;
  whatIf: WhatIf;
  onChange: (w: WhatIf) => void;
  units: UnitSystem;
  onSave: ((title: string) => void) | null;
  saveState: { kind: 'idle' } | { kind: 'saving' } | { kind: 'saved'; id: number } | { kind: 'error'; message: string };
}) {
  const truck = original.objects.find((o): o is TruckObject => o.kind === 'truck');
  const load = original.objects.find((o): o is LoadObject => o.kind === 'load');
  const [title, setTitle] = useState('');
  const massUnit = units === 'metric' ? 'kg' : 'lb';
  const lenUnit = units === 'metric' ? 'm' : 'ft';
  const toMass = (kg: number) => (units === 'metric' ? kg : kg / KG_PER_LB);
  const fromMass = (v: number) => (units === 'metric' ? v : v * KG_PER_LB);
  const toLen = (m: number) => (units === 'metric' ? m : m / M_PER_FT);
  const fromLen = (v: number) => (units === 'metric' ? v : v * M_PER_FT);
  const num = (s: string) => (s.trim() === '' || !Number.isFinite(Number(s)) ? undefined : Number(s));
  const round = (v: number, d: number) => Math.round(v * 10 ** d) / 10 ** d;
  return (
    <section aria-label="What-if sandbox" className="grid gap-2 rounded-plate border-2 border-dashed border-signal bg-signal-light/40 p-3 text-sm" data-testid="what-if">
      <p className="font-bold">Sandbox: these changes are not saved to the scene.</p>
      <p className="text-xs text-ink-soft">The figures update as you type. The saved plan and its revisions stay exactly as they are.</p>
      {load && (
        <label className="flex items-center justify-between gap-2">
          Load mass ({massUnit})
          <input
            className={field}
            type="number"
            min={0}
            data-testid="what-if-mass"
            defaultValue={round(toMass(whatIf.loadMassKg ?? loadMass(load)), 0)}
            onChange={(e) => {
              const v = num(e.target.value);
              onChange({ ...whatIf, loadMassKg: v === undefined ? undefined : fromMass(v) });
            }}
          />
        </label>
      )}
      {truck &&
        Object.entries(truck.legs).map(([id, leg]) => {
          const w = whatIf.legs?.[id] ?? {};
          const crib = w.cribbing ?? !!leg.cribbing;
          const setLeg = (change: { extension?: number; cribbing?: boolean }) => onChange({ ...whatIf, legs: { ...whatIf.legs, [id]: { ...w, ...change } } });
          return (
            <div key={id} className="flex items-center justify-between gap-2">
              <span className="w-10 font-semibold">{id}</span>
              <label className="flex items-center gap-1">
                out ({lenUnit})
                <input className={field} type="number" min={0} step={0.1} defaultValue={round(toLen(w.extension ?? leg.extension), 2)} onChange={(e) => setLeg({ extension: num(e.target.value) === undefined ? undefined : fromLen(num(e.target.value)!) })} />
              </label>
              <label className="flex items-center gap-1">
                <input type="checkbox" className="h-5 w-5 accent-teal" checked={crib} onChange={(e) => setLeg({ cribbing: e.target.checked })} />
                cribbing
              </label>
            </div>
          );
        })}
      <div className="flex items-center justify-between gap-2">
        <label className="flex items-center gap-1">
          Pick (°)
          <input className={field} type="number" step={1} defaultValue={whatIf.pick ?? original.swing.from} onChange={(e) => onChange({ ...whatIf, pick: num(e.target.value) })} />
        </label>
        <label className="flex items-center gap-1">
          Set (°)
          <input className={field} type="number" step={1} defaultValue={whatIf.set ?? original.swing.to} onChange={(e) => onChange({ ...whatIf, set: num(e.target.value) })} />
        </label>
      </div>
      {onSave && (
        <form
          className="mt-1 grid gap-1 border-t border-paper-line pt-2"
          onSubmit={(e) => {
            e.preventDefault();
            onSave(title);
          }}
        >
          <label className="grid gap-1">
            Title for the training scene
            <input className="min-h-touch rounded-plate border-2 border-ink bg-paper-raised px-2" value={title} onChange={(e) => setTitle(e.target.value)} placeholder="e.g. Coil transfer with RR pulled in" required minLength={3} maxLength={120} />
          </label>
          <button type="submit" className="min-h-touch rounded-plate border-2 border-ink bg-signal px-3 font-semibold" disabled={saveState.kind === 'saving'}>
            Save as a training scene
          </button>
          {saveState.kind === 'saved' && (
            <p role="status">
              Saved as a new training scene. <a className="font-semibold underline" href={`/scenes/${saveState.id}/replay`}>Open it</a>
            </p>
          )}
          {saveState.kind === 'error' && <p role="alert" className="text-over">{saveState.message}</p>}
        </form>
      )}
    </section>
  );
}
