'use client';
import type { SceneObject } from '@/lib/scene/objects';
import { useEditorContext, useEditorState } from '../../editor-context';
import { updateObject } from '../../commands/objects';
import { TextField } from '../fields';
import { Bound } from './bound-field';
import { objectFields } from './object-fields';
import { Section } from './section';

/** Position, turn, label and lock: every object has them. */
export function CommonFields({ o }: { o: SceneObject }) {
  const { store } = useEditorContext();
  const units = useEditorState((s) => s.units);
  const viewOnly = useEditorState((s) => s.readOnly);
  const ro = viewOnly || o.locked;
  const up = (patch: Record<string, unknown>) => store.getState().run(updateObject(o.id, patch as Partial<SceneObject>));
  return (
    <Section title="Where">
      {objectFields(o, units).map((f) => (
        <Bound key={f.key} field={f} disabled={ro} />
      ))}
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
