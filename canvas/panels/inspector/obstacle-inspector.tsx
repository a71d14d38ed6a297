'use client';
import type { ObstacleObject } from '@/lib/scene/objects';
import { OBSTACLE_KINDS } from '@/lib/scene/objects';
import { useEditorContext, useEditorState } from '../../editor-context';
import { updateObject } from '../../commands/objects';
import { LengthField, NumberField, SelectField } from '../fields';
import { Section } from './section';
import { touchHint, useTouch } from '../use-touch';

const KIND_LABEL: Record<(typeof OBSTACLE_KINDS)[number], string> = {
  structure: 'Structure',
  vehicle: 'Vehicle',
  pole: 'Pole',
  tree: 'Tree',
  'traffic-lane': 'Traffic lane',
  'power-line': 'Power line',
};

/** Kind, size and height; a power line's voltage and wire height. */
export function ObstacleInspector({ o }: { o: ObstacleObject }) {
  const { store } = useEditorContext();
  const units = useEditorState((s) => s.units);
  const ro = useEditorState((s) => s.readOnly) || o.locked;
  const up = (patch: Partial<ObstacleObject>) => store.getState().run(updateObject(o.id, patch as never));
  const s = o.shape;
  const wire = o.obstacleKind === 'power-line';
  const touch = useTouch();
  return (
    <Section title={wire ? 'Power line' : 'Obstacle'}>
      <SelectField
        label="Kind"
        value={o.obstacleKind}
        disabled={ro || wire}
        options={OBSTACLE_KINDS.filter((k) => k !== 'power-line' || wire).map((k) => ({ value: k, label: KIND_LABEL[k] }))}
        onCommit={(obstacleKind) => up({ obstacleKind })}
      />
      <LengthField label={wire ? 'Lowest wire height' : 'Height of its top'} value={o.height} units={units} min={0} max={200} disabled={ro} onCommit={(height) => up({ height })} testId="field-height" />
      {wire && (
        <NumberField
          label="Voltage (kV; blank if unknown)"
          value={o.voltageKV ?? 0}
          min={0}
          max={1000}
          disabled={ro}
          onCommit={(v) => up({ voltageKV: v > 0 ? v : null })}
          testId="field-voltage"
        />
      )}
      {s.kind === 'rect' && (
        <>
          <LengthField label="Length" value={s.length} units={units} min={0.05} max={500} disabled={ro} onCommit={(length) => up({ shape: { ...s, length } })} />
          <LengthField label="Width" value={s.width} units={units} min={0.05} max={500} disabled={ro} onCommit={(width) => up({ shape: { ...s, width } })} />
        </>
      )}
      {s.kind === 'circle' && <LengthField label="Diameter" value={s.diameter} units={units} min={0.05} max={100} disabled={ro} onCommit={(diameter) => up({ shape: { ...s, diameter } })} />}
      {s.kind === 'line' && <LengthField label="Span shown" value={s.length} units={units} min={1} max={1000} disabled={ro} onCommit={(length) => up({ shape: { ...s, length } })} />}
      {s.kind === 'polygon' && <p className="col-span-2 text-xs text-ink-muted">{s.points.length} corners. {touchHint('Redraw with the outline tool (P) to change the shape.', touch)}</p>}
    </Section>
  );
}
