'use client';
import { useEditorContext, useEditorState } from '../../editor-context';
import { setDocumentFields, setSwing } from '../../commands/truck';
import { SelectField } from '../fields';
import { Bound } from './bound-field';
import { sceneFields } from './bound-fields';
import { Section } from './section';
import { SOIL_CHOICES } from '@/lib/lift/soil';
import { arcOf } from '@/lib/lift/swing';
import { BackgroundPanel } from '../../background/background-panel';
import { screenToWorld } from '../../editor/camera';
import { formatPressure } from '@/lib/format/quantity';
import { wrap180 } from '@/lib/angles';
import { slewToward } from '../../commands/aim';
import type { SceneDocument } from '@/lib/scene/schema';
import type { SceneObject, TruckObject } from '@/lib/scene/objects';

/** What the engine will analyse for these fields (lib/lift/swing.ts), so 0° → 360° is never read as one slew. */
export function arcWords(swing: { from: number; to: number; direction: 'ccw' | 'cw' }): string {
  const a = arcOf(swing);
  if (a.fullTurn) return 'Checked over a full turn: every slew.';
  if (a.span === 0) return 'Pick and set are the same slew: checked at that one slew only.';
  return `Checked over ${Math.round(a.span * 10) / 10}° ${a.sign === 1 ? 'counter-clockwise' : 'clockwise'}.`;
}

/**
 * Pick and set as the editor fills them in: when the load (or the receiving trailer) is placed, the swing's
 * end is aimed at it. Said beside the fields while the figure still points there.
 */
export function autoFilledSwing(doc: SceneDocument): string[] {
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  if (!truck) return [];
  const aims = (o: SceneObject | undefined, slew: number) => !!o && Math.abs(wrap180(slewToward(truck, o) - slew)) < 0.05;
  const out: string[] = [];
  if (aims(doc.objects.find((o) => o.kind === 'load'), doc.swing.from)) out.push('Pick was filled in to point at the load.');
  if (aims(doc.objects.find((o) => o.kind === 'trailer'), doc.swing.to)) out.push('Set was filled in to point at the receiving trailer.');
  return out;
}

/** The swing plan, the ground and the plan's limits (nothing selected). */
export function SceneSettings() {
  const { store } = useEditorContext();
  // The parts of the document shown here, not the document: dragging the truck re-renders this panel only
  // when the pick or set stops (or starts) pointing at the load or the trailer.
  const swing = useEditorState((s) => s.document.swing);
  const soil = useEditorState((s) => s.document.soil);
  const background = useEditorState((s) => s.document.background);
  const autoWords = useEditorState((s) => autoFilledSwing(s.document).join(' '));
  const units = useEditorState((s) => s.units);
  const ro = useEditorState((s) => s.readOnly);
  const run = store.getState().run;
  const sceneId = useEditorState((s) => s.sceneId);
  const fields = sceneFields(units);
  return (
    <div data-testid="scene-settings">
      <p className="mb-3 text-sm text-ink-muted">Nothing selected. Press an object on the plan to see its exact values; these settings belong to the whole scene.</p>
      <Section title="Swing plan">
        {fields.slice(0, 2).map((f) => (
          <Bound key={f.key} field={f} disabled={ro} />
        ))}
        {autoWords && (
          <p className="col-span-2 rounded bg-paper-sunk px-2 py-1 text-xs text-ink-soft" data-testid="swing-auto">
            {autoWords} Type a figure to change it.
          </p>
        )}
        <div className="col-span-2">
          <SelectField
            label="Direction"
            value={swing.direction}
            disabled={ro}
            testId="field-direction"
            options={[
              { value: 'ccw', label: 'Counter-clockwise (to the left, seen from above)' },
              { value: 'cw', label: 'Clockwise (to the right)' },
            ]}
            onCommit={(direction) => run(setSwing({ direction }))}
          />
        </div>
        <p className="col-span-2 text-xs text-ink-muted" data-testid="swing-arc">
          {arcWords(swing)}
        </p>
      </Section>
      <Section title="Ground">
        <div className="col-span-2">
          <SelectField
            label="Ground under the pads"
            value={soil.preset}
            disabled={ro}
            options={[{ value: 'custom', label: 'Entered value' }, ...SOIL_CHOICES.map((s) => ({ value: s.id, label: `${s.label} — IBC Table 1806.2, ${formatPressure(s.kPa, units)}` }))]}
            onCommit={(preset) => {
              const c = SOIL_CHOICES.find((s) => s.id === preset);
              run(setDocumentFields({ soil: { preset, allowable: c ? c.kPa : soil.allowable } }));
            }}
          />
        </div>
        <Bound field={fields[2]} disabled={ro} />
      </Section>
      <Section title="Limits of this plan">
        {fields.slice(3).map((f) => (
          <Bound key={f.key} field={f} disabled={ro} />
        ))}
      </Section>
      {sceneId !== null && (
        <section className="mb-4">
          <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-muted">Site image</h3>
          <BackgroundPanel
            sceneId={sceneId}
            background={background}
            units={units}
            canEdit={!ro}
            placeAt={() => {
              const s = store.getState();
              return screenToWorld(s.camera, s.viewport, { x: s.viewport.width / 2, y: s.viewport.height / 2 });
            }}
            onChange={(background) => run(setDocumentFields({ background }))}
          />
        </section>
      )}
    </div>
  );
}
