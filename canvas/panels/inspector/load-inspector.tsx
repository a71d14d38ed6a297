'use client';
import type { LoadObject, LoadShape } from '@/lib/scene/objects';
import { useEditorContext, useEditorState } from '../../editor-context';
import { updateObject } from '../../commands/objects';
import { LengthField, MassField, NumberField, SelectField, SpecField } from '../fields';
import { densitySpec, estimateWords } from './load-estimate';
import { Section } from './section';
import { loadMass } from '@/lib/scene/geometry/load';
import { formatMass } from '@/lib/format/quantity';
import { RiggingPicker } from './rigging-picker';

/** The load's shape, weight (given or estimated), hang and rigging. */
export function LoadInspector({ load }: { load: LoadObject }) {
  const { store } = useEditorContext();
  const units = useEditorState((s) => s.units);
  const ro = useEditorState((s) => s.readOnly) || load.locked;
  const up = (patch: Partial<LoadObject>) => store.getState().run(updateObject(load.id, patch));
  const shape = (patch: Partial<LoadShape>) => up({ shape: { ...load.shape, ...patch } as LoadShape });
  const s = load.shape;
  const metric = units === 'metric';
  return (
    <>
      <Section title="Shape">
        <SelectField
          label="Kind"
          value={s.kind}
          disabled={ro}
          options={[
            { value: 'coil', label: 'Steel coil' },
            { value: 'box', label: 'Box or crate' },
            { value: 'vehicle', label: 'Vehicle' },
          ]}
          onCommit={(kind) =>
            up({
              shape: kind === 'coil' ? { kind, eye: 'horizontal', outerDiameter: 1.8, innerDiameter: 0.6, width: 1.5 } : kind === 'box' ? { kind, length: 2.4, width: 1.2, height: 1.2 } : { kind, length: 7.5, width: 2.4, height: 3.2 },
              ...(kind !== 'coil' && load.massMode === 'estimate' ? { massMode: 'given', massKg: loadMass(load) } : {}),
            })
          }
        />
        {s.kind === 'coil' ? (
          <>
            <SelectField label="Eye" value={s.eye} disabled={ro} options={[{ value: 'horizontal', label: 'Eye horizontal (on its roll)' }, { value: 'vertical', label: 'Eye vertical (on its face)' }]} onCommit={(eye) => shape({ eye })} />
            <LengthField label="Outside diameter" value={s.outerDiameter} units={units} min={0.1} max={5} disabled={ro} onCommit={(outerDiameter) => shape({ outerDiameter })} />
            <LengthField label="Inside diameter" value={s.innerDiameter} units={units} min={0.01} max={Math.min(4, s.outerDiameter - 0.01)} rangeWhy="inside the outside diameter:" disabled={ro} onCommit={(innerDiameter) => shape({ innerDiameter })} />
            <LengthField label="Width" value={s.width} units={units} min={0.1} max={5} disabled={ro} onCommit={(width) => shape({ width })} />
          </>
        ) : (
          <>
            <LengthField label="Length" value={s.length} units={units} min={0.1} max={30} disabled={ro} onCommit={(length) => shape({ length })} />
            <LengthField label="Width" value={s.width} units={units} min={0.1} max={s.kind === 'box' ? 10 : 5} disabled={ro} onCommit={(width) => shape({ width })} />
            <LengthField label="Height" value={s.height} units={units} min={0.1} max={s.kind === 'box' ? 10 : 6} disabled={ro} onCommit={(height) => shape({ height })} />
          </>
        )}
      </Section>
      <Section title="Weight">
        {load.massMode === 'estimate' && (
          <div className="col-span-2 rounded-md border border-signal-dark bg-signal-light p-2 text-sm" role="status" data-testid="weight-estimated">
            <p>
              <strong>Estimated from its size, not weighed:</strong> {estimateWords(load, units)}.
            </p>
            {!ro && (
              <button type="button" className="mt-1 min-h-11 rounded-md border border-teal bg-paper-raised px-3 text-sm font-semibold text-teal" onClick={() => up({ massMode: 'given', massKg: Math.round(loadMass(load)) })}>
                Enter the known weight instead
              </button>
            )}
          </div>
        )}
        <SelectField label="Weight from" value={load.massMode} disabled={ro} options={[{ value: 'given', label: 'Known weight' }, { value: 'estimate', label: 'Estimate from size' }]} onCommit={(massMode) => up({ massMode, ...(massMode === 'given' ? { massKg: Math.round(loadMass(load)) } : {}) })} />
        {load.massMode === 'given' ? (
          <MassField label="Weight" value={load.massKg} units={units} max={500_000} disabled={ro} onCommit={(massKg) => up({ massKg })} testId="field-load-mass" />
        ) : (
          <SpecField label={`Density (${metric ? 'kg/m³' : 'lb/ft³'})`} value={load.density} spec={densitySpec(units)} disabled={ro} onCommit={(density) => up({ density })} testId="field-density" />
        )}
        <NumberField label="Uncertainty (±%)" value={load.weightUncertainty} suffix="%" min={0} max={100} disabled={ro} onCommit={(weightUncertainty) => up({ weightUncertainty })} />
        <div className="col-span-2 text-sm" data-testid="load-weight">
          Planned weight <strong>{formatMass(loadMass(load), units)}</strong>
          {load.massMode === 'estimate' && ' (estimated)'}
          {load.weightUncertainty > 0 && <> · upper {formatMass(loadMass(load) * (1 + load.weightUncertainty / 100), units)}</>}
        </div>
      </Section>
      <Section title="Hook and centre of gravity">
        <LengthField label="Tip to load bottom" value={load.hang} units={units} min={0} max={60} disabled={ro} onCommit={(hang) => up({ hang })} />
        <MassField label="Hook block" value={load.blockMassKg} units={units} max={5000} disabled={ro} onCommit={(blockMassKg) => up({ blockMassKg })} />
        <LengthField label="CG along" value={load.cg.x} units={units} min={-15} max={15} disabled={ro} onCommit={(x) => up({ cg: { ...load.cg, x } })} />
        <LengthField label="CG up from bottom" value={load.cg.z} units={units} min={0} max={10} disabled={ro} onCommit={(z) => up({ cg: { ...load.cg, z } })} />
      </Section>
      <RiggingPicker load={load} />
    </>
  );
}
