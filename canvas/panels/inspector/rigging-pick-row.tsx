'use client';
import { kindLabel } from '@/components/rigging/labels';
import type { RiggingPick } from '@/lib/scene/objects';
import type { UnitSystem } from '@/lib/units';
import { formatMass } from '@/lib/format/quantity';
import { riggingNotes } from '@/lib/format/rigging-words';
import { pickVerdict } from '@/lib/equipment/rigging-to-lift';
import { NumberField, SelectField } from '../fields';
import type { RiggingNotice } from './rigging-status';

export function Notice({ notice, testId }: { notice: RiggingNotice; testId?: string }) {
  const stop = notice.tone === 'stop';
  return (
    <p data-testid={testId} role={stop ? 'alert' : 'status'} className={`mt-1 rounded border-l-4 px-2 py-1 text-xs font-medium ${stop ? 'border-over bg-over-light text-over' : 'border-signal-dark bg-signal-light text-ink'}`}>
      {notice.text.split(/(\d{4}-\d{2}-\d{2})/).map((part, i) => (i % 2 ? <span key={i} className="whitespace-nowrap">{part}</span> : part))}
    </p>
  );
}

const HITCHES = [
  { value: 'vertical', label: 'Vertical' },
  { value: 'choker', label: 'Choker' },
  { value: 'basket', label: 'Basket' },
] as const;

/** What the row asks for depends on the kind: slings have hitches, shackles and hooks sit in legs, blocks turn a line. */
const isLegFitting = (kind: string) => kind === 'shackle' || kind === 'hook';

/**
 * One picked item: its fields for its own kind and the engine's verdict on it alone against this load
 * (the results panel holds the same check for the whole plan).
 */
export function RiggingPickRow(props: { pick: RiggingPick; notices: RiggingNotice[]; loadMass: number; hookLoad: number; units: UnitSystem; readOnly: boolean; onChange(p: RiggingPick): void; onRemove(): void }) {
  const { pick: r, units, readOnly: ro, onChange } = props;
  const v = pickVerdict(r, props.loadMass, props.hookLoad);
  const notes = v ? riggingNotes({ ...v.facts, element: v.element }) : null;
  const set = (patch: Partial<RiggingPick>) => onChange({ ...r, ...patch });
  const legs = <NumberField label="Legs" value={r.legs} min={1} max={8} digits={0} disabled={ro} onCommit={(n) => set({ legs: Math.round(n) })} />;
  const angle = <NumberField label="Angle (° up)" value={r.angleFromHorizontal} min={1} max={90} disabled={ro} onCommit={(a) => set({ angleFromHorizontal: a })} />;
  return (
    <li className="rounded-md border border-paper-line p-2 text-sm" data-testid={`rigging-row-${r.tag}`}>
      <div className="flex items-center justify-between gap-2">
        <span className="min-w-0 font-semibold">
          {r.tag} · {kindLabel(r.kind)}
          {r.size ? <span className="font-normal text-ink-soft"> · {r.size}</span> : null}
        </span>
        {!ro && (
          <button type="button" className="min-h-11 shrink-0 px-2 text-over" onClick={props.onRemove}>
            Remove
          </button>
        )}
      </div>
      {props.notices.map((n) => <Notice key={n.text} notice={n} />)}
      {r.kind === 'snatch-block' ? (
        <div className="mt-1 grid grid-cols-2 gap-2">
          <NumberField label="Angle between lines (°)" value={r.lineAngle ?? 0} min={0} max={180} disabled={ro} onCommit={(a) => set({ lineAngle: a })} />
        </div>
      ) : isLegFitting(r.kind) ? (
        <div className="mt-1 grid grid-cols-2 gap-2">
          {legs}
          {angle}
        </div>
      ) : (
        <div className="mt-1 grid grid-cols-3 gap-2">
          <SelectField label="Hitch" value={r.hitch} disabled={ro} options={[...HITCHES]} onCommit={(hitch) => set({ hitch, ratingKg: r.ratings?.[hitch] ?? r.ratingKg })} />
          {legs}
          {angle}
          {r.hitch === 'choker' && <NumberField label="Choke angle (°)" value={r.chokeAngle ?? 135} min={0} max={180} disabled={ro} onCommit={(a) => set({ chokeAngle: a })} />}
          {r.hitch === 'basket' && r.kind === 'wire-rope-sling' && <NumberField label="Bend D/d" value={r.bendRatio ?? 25} min={0.1} max={1000} disabled={ro} onCommit={(d) => set({ bendRatio: d })} />}
        </div>
      )}
      {v?.facts.refused ? (
        <Notice notice={{ tone: 'stop', text: `Not lifting rigging: ${v.facts.refused.reason}` }} />
      ) : v ? (
        <>
          <p className="mt-1 text-xs text-ink-muted" data-testid={`rigging-capacity-${r.tag}`}>
            {v.element === 'sling' ? `Capacity as rigged ${formatMass(v.capacity, units)}` : `WLL ${formatMass(v.capacity, units)}, carries ${formatMass(v.demand, units)}`}
            {v.element === 'sling' && ` for a ${formatMass(v.demand, units)} load`}
          </p>
          {notes!.assumptions.map((a) => (
            <p key={a} className="text-xs text-ink-muted">
              {a}
            </p>
          ))}
          {notes!.warnings.map((w) => <Notice key={w} notice={{ tone: 'warn', text: w }} />)}
        </>
      ) : null}
    </li>
  );
}
