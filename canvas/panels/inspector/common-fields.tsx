'use client';
import type { SceneObject } from '@/lib/scene/objects';
import { useEditorContext, useEditorState } from '../../editor-context';
import { updateObject } from '../../commands/objects';
import { LengthField, NumberField, TextField } from '../fields';
import { Section } from './section';

/** Position, turn, label and lock: every object has them. */
export function CommonFields({ o, turnLabel = 'Turned (° from east, CCW)' }: { o: SceneObject; turnLabel?: string }) {
  const { store } = useEditorContext();
  const units = useEditorState((s) => s.units);
  const viewOnly = useEditorState((s) => s.readOnly);
  const ro = viewOnly || o.locked;
  const up = (patch: Record<string, unknown>) => store.getState().run(updateObject(o.id, patch as Partial<SceneObject>));
  return (
    <Section title="Where">
      <LengthField label="East (x)" value={o.x} units={units} disabled={ro} onCommit={(x) => up({ x })} testId="field-x" />
      <LengthField label="North (y)" value={o.y} units={units} disabled={ro} onCommit={(y) => up({ y })} testId="field-y" />
      {o.kind !== 'tape' && <NumberField label={turnLabel} value={o.rotation} suffix="°" disabled={ro} onCommit={(rotation) => up({ rotation })} testId="field-rotation" />}
      <div className="col-span-2">
        <TextField label="Label on the plan" value={o.label} disabled={viewOnly} onCommit={(label) => up({ label })} />
      </div>
      <label className="col-span-2 flex min-h-11 items-center gap-2 text-sm">
        <input type="checkbox" className="h-5 w-5 accent-teal" checked={o.locked} disabled={viewOnly} onChange={(e) => up({ locked: e.target.checked })} />
        Locked (cannot be moved or deleted)
      </label>
    </Section>
  );
}
