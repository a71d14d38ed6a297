'use client';
import { useShallow } from 'zustand/react/shallow';
import { useEditorContext, useEditorState } from '../../editor-context';
import { CommonFields } from './common-fields';
import { TruckInspector } from './truck-inspector';
import { LoadInspector } from './load-inspector';
import { ObstacleInspector } from './obstacle-inspector';
import { SceneSettings } from './scene-settings';
import { updateObject } from '../../commands/objects';
import { LengthField, TextField } from '../fields';
import { Section } from './section';
import { deleteSelection, duplicate } from '../../editor/actions';
import type { SceneObject } from '@/lib/scene/objects';
import { SITE_LIMIT } from '@/lib/scene/primitives';

const KIND_NAMES: Record<SceneObject['kind'], string> = { truck: 'Truck', load: 'Load', trailer: 'Receiving trailer', obstacle: 'Obstacle', note: 'Note', tape: 'Measuring tape' };

/** Exact values for the selection, or the scene's own settings when nothing is selected. */
export function Inspector() {
  const { store, editor } = useEditorContext();
  // The selected objects only (compared item by item): a drag of something else does not re-render the panel.
  const sel = useEditorState(useShallow((s) => s.document.objects.filter((o) => s.selection.includes(o.id))));
  const units = useEditorState((s) => s.units);
  const readOnly = useEditorState((s) => s.readOnly);
  if (sel.length === 0) return <SceneSettings />;
  if (sel.length > 1) {
    return (
      <div>
        <p className="mb-3 text-sm">{sel.length} objects selected. Drag any of them to move them together.</p>
        {!readOnly && (
          <div className="flex gap-2">
            <button type="button" className="min-h-11 rounded-md border border-paper-line px-3 text-sm" onClick={() => duplicate(editor)}>
              Duplicate
            </button>
            <button type="button" className="min-h-11 rounded-md border border-over px-3 text-sm text-over" onClick={() => deleteSelection(editor)}>
              Delete
            </button>
          </div>
        )}
      </div>
    );
  }
  const o = sel[0];
  const ro = readOnly || o.locked;
  const up = (patch: Record<string, unknown>) => store.getState().run(updateObject(o.id, patch as Partial<SceneObject>));
  return (
    <div data-testid={`inspector-${o.kind}`}>
      <div className="mb-3 flex items-center justify-between">
        <h2 className="text-base font-semibold">{KIND_NAMES[o.kind]}</h2>
        {!readOnly && !o.locked && o.kind !== 'truck' && (
          <button type="button" className="min-h-11 rounded-md px-3 text-sm text-over hover:bg-over-light" onClick={() => deleteSelection(editor)}>
            Delete
          </button>
        )}
      </div>
      {o.kind === 'truck' && <TruckInspector truck={o} />}
      {o.kind === 'load' && <LoadInspector load={o} />}
      {o.kind === 'obstacle' && <ObstacleInspector o={o} />}
      {o.kind === 'trailer' && (
        <Section title="Trailer">
          <LengthField label="Length" value={o.length} units={units} min={1} max={30} disabled={ro} onCommit={(length) => up({ length })} />
          <LengthField label="Width" value={o.width} units={units} min={0.5} max={4} disabled={ro} onCommit={(width) => up({ width })} />
          <LengthField label="Deck height" value={o.deckHeight} units={units} min={0} max={200} disabled={ro} onCommit={(deckHeight) => up({ deckHeight })} testId="field-deck-height" />
        </Section>
      )}
      {o.kind === 'note' && (
        <div className="mb-4">
          <TextField label="Text" value={o.text} multiline disabled={readOnly} onCommit={(text) => up({ text })} />
        </div>
      )}
      {o.kind === 'tape' && (
        <Section title="Far end">
          <LengthField label="East (x)" value={o.x2} units={units} min={-SITE_LIMIT} max={SITE_LIMIT} disabled={ro} onCommit={(x2) => up({ x2 })} />
          <LengthField label="North (y)" value={o.y2} units={units} min={-SITE_LIMIT} max={SITE_LIMIT} disabled={ro} onCommit={(y2) => up({ y2 })} />
        </Section>
      )}
      <CommonFields o={o} />
    </div>
  );
}
