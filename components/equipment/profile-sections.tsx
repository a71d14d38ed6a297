'use client';

import { useContext } from 'react';
import { useController, useFieldArray, useFormContext, type FieldValues } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select';
import { FormUnits, NumField, Row, Section, SubHeading, TextInput, collectIssues, useFieldError } from './form-fields';

export { collectIssues } from './form-fields';
import { LoadChartGrid } from './load-chart-grid';
import { formatLength } from '@/lib/format/quantity';
import { BOOM_WIDTH } from '@/lib/lift/schema';

const XYZ = ({ base, label }: { base: string; label: string }) => (
  <Row cols={3}>
    <NumField name={`${base}.x`} label={`${label} x (forward)`} quantity="length" />
    <NumField name={`${base}.y`} label={`${label} y (left)`} quantity="length" />
    <NumField name={`${base}.z`} label={`${label} height`} quantity="length" />
  </Row>
);

export function IdentitySection() {
  const { register } = useFormContext();
  const { readOnly } = useContext(FormUnits);
  return (
    <Section id="identity" title="Identity">
      <Row cols={2}>
        <TextInput name="unitNumber" label="Unit number" hint="As painted on the truck, e.g. HR-7" />
        <TextInput name="name" label="Name" />
      </Row>
      <label className="flex min-h-touch items-center gap-3 text-body">
        <input type="checkbox" className="h-5 w-5 accent-teal" disabled={readOnly} {...register('inService')} /> In service
      </label>
      <div className="flex flex-col gap-1.5">
        <label htmlFor="spec-notes" className="text-label">
          Notes
        </label>
        <textarea id="spec-notes" rows={2} disabled={readOnly} className="rounded-plate border-2 border-paper-edge bg-paper-raised px-3 py-2 text-body" {...register('spec.notes')} />
      </div>
    </Section>
  );
}

export function CarrierSection() {
  return (
    <Section id="carrier" title="Carrier" description="Measured forward from the rear edge of the tailboard (x) and left of the centreline (y).">
      <Row cols={2}>
        <NumField name="spec.carrier.length" label="Overall length" quantity="length" />
        <NumField name="spec.carrier.width" label="Overall width" quantity="length" />
      </Row>
      {(['tailboard', 'body', 'cab'] as const).map((p) => (
        <div key={p} className="space-y-2">
          <SubHeading>{p === 'tailboard' ? 'Tailboard' : p === 'body' ? 'Body' : 'Cab'}</SubHeading>
          <Row cols={4}>
            <NumField name={`spec.carrier.${p}.rear`} label="Rear edge" quantity="length" />
            <NumField name={`spec.carrier.${p}.front`} label="Front edge" quantity="length" />
            <NumField name={`spec.carrier.${p}.width`} label="Width" quantity="length" />
            <NumField name={`spec.carrier.${p}.top`} label="Top height" quantity="length" />
          </Row>
        </div>
      ))}
      <SubHeading>Mass and centre of gravity</SubHeading>
      <NumField name="spec.carrier.mass" label="Carrier mass (without the upper and boom)" quantity="mass" />
      <XYZ base="spec.carrier.cg" label="CG" />
      <SubHeading>Stowed</SubHeading>
      <Row cols={3}>
        <NumField name="spec.carrier.stowedHeight" label="Stowed height" quantity="length" />
        <NumField name="spec.carrier.boomStowed.slew" label="Boom slew when stowed" quantity="angle" />
        <NumField name="spec.carrier.boomStowed.elevation" label="Boom elevation when stowed" quantity="angle" />
      </Row>
    </Section>
  );
}

export function UpperSection() {
  const { readOnly } = useContext(FormUnits);
  const { field } = useController<FieldValues>({ name: 'spec.upper.slewLimits' });
  const limited = field.value !== null && field.value !== undefined;
  return (
    <Section id="upper" title="Upper" description="Turret and counterweight positions are from the slew axis, with the boom pointing forward.">
      <Row cols={2}>
        <NumField name="spec.upper.slewAxis.x" label="Slew axis x (forward)" quantity="length" />
        <NumField name="spec.upper.slewAxis.y" label="Slew axis y (left)" quantity="length" />
      </Row>
      <NumField name="spec.upper.turret.mass" label="Turret mass" quantity="mass" />
      <XYZ base="spec.upper.turret.cg" label="Turret CG" />
      <NumField name="spec.upper.counterweight.mass" label="Counterweight mass (0 if none)" quantity="mass" />
      <XYZ base="spec.upper.counterweight.cg" label="Counterweight CG" />
      <label className="flex min-h-touch items-center gap-3 text-body">
        <input type="checkbox" className="h-5 w-5 accent-teal" disabled={readOnly} checked={!limited} onChange={(e) => field.onChange(e.target.checked ? null : { min: -180, max: 180 })} /> Slews all the way round
      </label>
      {limited && (
        <Row cols={2}>
          <NumField name="spec.upper.slewLimits.min" label="Slew limit from" quantity="angle" />
          <NumField name="spec.upper.slewLimits.max" label="Slew limit to (counter-clockwise)" quantity="angle" />
        </Row>
      )}
    </Section>
  );
}

export function BoomSection() {
  const { units, readOnly } = useContext(FormUnits);
  const { fields, append, remove } = useFieldArray<FieldValues>({ name: 'spec.boom.stages' });
  const stagesError = useFieldError('spec.boom.stages');
  return (
    <Section id="boom" title="Boom" description="Pivot from the slew axis. One row per stage: its pivot-to-tip length and where the boom's CG sits (fraction of the way to the tip).">
      <XYZ base="spec.boom.pivot" label="Pivot" />
      <SubHeading>Stages (each longer than the one before)</SubHeading>
      {fields.map((f, i) => (
        <div key={f.id} className="grid grid-cols-1 items-end gap-3 sm:grid-cols-[1fr_1fr_1fr_auto]">
          <TextInput name={`spec.boom.stages.${i}.name`} label={`Stage ${i + 1} name`} />
          <NumField name={`spec.boom.stages.${i}.length`} label="Length" quantity="length" />
          <NumField name={`spec.boom.stages.${i}.cgFraction`} label="CG fraction" quantity="fraction" />
          {!readOnly && fields.length > 1 ? (
            <Button variant="danger" onClick={() => remove(i)} aria-label={`Remove stage ${i + 1}`}>
              Remove
            </Button>
          ) : (
            <span />
          )}
        </div>
      ))}
      {stagesError && <p className="text-label font-semibold text-over">! {stagesError}</p>}
      {!readOnly && (
        <Button variant="secondary" onClick={() => append({ name: `Stage ${fields.length}`, length: NaN, cgFraction: 0.5 })}>
          + Boom stage
        </Button>
      )}
      <Row cols={3}>
        <NumField name="spec.boom.elevation.min" label="Lowest elevation" quantity="angle" />
        <NumField name="spec.boom.elevation.max" label="Highest elevation" quantity="angle" />
        <NumField name="spec.boom.mass" label="Boom mass" quantity="mass" />
      </Row>
      <Row cols={3}>
        <NumField
          name="spec.boom.width"
          label="Boom width (optional)"
          quantity="length"
          optional
          hint={`Overall width, checked against obstacles and the truck's own body. Empty: ${formatLength(BOOM_WIDTH, units)}.`}
        />
      </Row>
    </Section>
  );
}

export function OutriggersSection() {
  const { readOnly } = useContext(FormUnits);
  const { fields, append, remove } = useFieldArray<FieldValues>({ name: 'spec.outriggers.legs' });
  const legsError = useFieldError('spec.outriggers.legs');
  return (
    <Section id="outriggers" title="Outriggers" description="Mount point on the carrier, travel direction (0° forward, 90° out to the left, −90° to the right), and the mount-to-pad-centre reach at each stop.">
      {fields.map((f, i) => (
        <fieldset key={f.id} className="space-y-3 rounded-plate border border-paper-line p-3">
          <legend className="px-1 text-label font-bold">Leg {i + 1}</legend>
          <Row cols={4}>
            <TextInput name={`spec.outriggers.legs.${i}.id`} label="Leg id" />
            <NumField name={`spec.outriggers.legs.${i}.mount.x`} label="Mount x" quantity="length" />
            <NumField name={`spec.outriggers.legs.${i}.mount.y`} label="Mount y" quantity="length" />
            <NumField name={`spec.outriggers.legs.${i}.direction`} label="Direction" quantity="angle" />
          </Row>
          <Row cols={3}>
            <NumField name={`spec.outriggers.legs.${i}.stages.retracted`} label="Reach retracted" quantity="length" />
            <NumField name={`spec.outriggers.legs.${i}.stages.intermediate`} label="Reach intermediate (blank if none)" quantity="length" />
            <NumField name={`spec.outriggers.legs.${i}.stages.full`} label="Reach full" quantity="length" />
          </Row>
          <Row cols={3}>
            <NumField name={`spec.outriggers.legs.${i}.pad.length`} label="Pad length" quantity="length" />
            <NumField name={`spec.outriggers.legs.${i}.pad.width`} label="Pad width" quantity="length" />
            <NumField name={`spec.outriggers.legs.${i}.padRating`} label="Pad rating (largest load)" quantity="mass" />
          </Row>
          {!readOnly && (
            <Button variant="danger" onClick={() => remove(i)}>
              Remove leg {i + 1}
            </Button>
          )}
        </fieldset>
      ))}
      {legsError && <p className="text-label font-semibold text-over">! {legsError}</p>}
      {!readOnly && (
        <Button
          variant="secondary"
          onClick={() => append({ id: `L${fields.length + 1}`, mount: { x: 1, y: 0.5 }, direction: 90, stages: { retracted: 0.5, intermediate: null, full: 2.5 }, pad: { length: 0.6, width: 0.6 }, padRating: 10000 })}
        >
          + Leg
        </Button>
      )}
    </Section>
  );
}

export function WinchesSection() {
  const { readOnly } = useContext(FormUnits);
  const { fields, append, remove } = useFieldArray<FieldValues>({ name: 'spec.winches' });
  return (
    <Section id="winches" title="Winches" description="Rated line pull on the first layer, and how many parts of line the winch can rig with blocks.">
      {fields.map((f, i) => (
        <fieldset key={f.id} className="space-y-3 rounded-plate border border-paper-line p-3">
          <legend className="px-1 text-label font-bold">Winch {i + 1}</legend>
          <Row cols={3}>
            <TextInput name={`spec.winches.${i}.name`} label="Name" />
            <NumField name={`spec.winches.${i}.ratedLinePull`} label="Rated line pull (1st layer)" quantity="mass" />
            <NumField name={`spec.winches.${i}.maxParts`} label="Parts of line, at most" quantity="count" />
          </Row>
          <Row cols={2}>
            <NumField name={`spec.winches.${i}.ropeDiameter`} label="Rope diameter" quantity="diameter" />
            <NumField name={`spec.winches.${i}.ropeLength`} label="Rope length" quantity="length" />
          </Row>
          {!readOnly && (
            <Button variant="danger" onClick={() => remove(i)}>
              Remove winch {i + 1}
            </Button>
          )}
        </fieldset>
      ))}
      {!readOnly && (
        <Button variant="secondary" onClick={() => append({ name: `Winch ${fields.length + 1}`, ratedLinePull: 10000, ropeDiameter: 0.019, ropeLength: 60, maxParts: 2 })}>
          + Winch
        </Button>
      )}
    </Section>
  );
}

export function LoadChartSection({ serverIssues }: { serverIssues: { path: string; message: string }[] }) {
  const { units, readOnly } = useContext(FormUnits);
  const { register, formState } = useFormContext();
  const { field } = useController<FieldValues>({ name: 'spec.loadChart' });
  const sector = useController<FieldValues>({ name: 'spec.loadChart.conditions.sector' });
  const clientIssues = collectIssues(formState.errors, 'spec.loadChart').filter((i) => !i.path.startsWith('spec.loadChart.conditions'));
  const issues = clientIssues.length ? clientIssues : serverIssues.filter((i) => i.path.startsWith('spec.loadChart') && !i.path.startsWith('spec.loadChart.conditions'));
  return (
    <Section id="load-chart" title="Load chart" description="Rated loads by radius (rows) and boom length (columns), as the manufacturer's chart gives them. The lift check takes the next greater radius and next longer boom, never interpolating upward.">
      <Row cols={2}>
        <SelectField label="Applies on" disabled={readOnly} {...register('spec.loadChart.conditions.supports')}>
          <option value="outriggers-full">Outriggers fully extended</option>
          <option value="outriggers-intermediate">Outriggers at intermediate</option>
          <option value="outriggers-retracted">Outriggers retracted</option>
          <option value="on-tyres">On tyres</option>
        </SelectField>
        <label className="flex min-h-touch items-center gap-3 self-end text-body">
          <input type="checkbox" className="h-5 w-5 accent-teal" disabled={readOnly} checked={sector.field.value === null} onChange={(e) => sector.field.onChange(e.target.checked ? null : { from: 90, to: 270 })} /> All the way round (360°)
        </label>
      </Row>
      {sector.field.value !== null && sector.field.value !== undefined && (
        <Row cols={2}>
          <NumField name="spec.loadChart.conditions.sector.from" label="Sector from" quantity="angle" />
          <NumField name="spec.loadChart.conditions.sector.to" label="Sector to (counter-clockwise)" quantity="angle" />
        </Row>
      )}
      <TextInput name="spec.loadChart.conditions.note" label="Chart note (conditions as the chart states them)" />
      <LoadChartGrid value={field.value} onChange={(g) => field.onChange({ ...field.value, ...g })} units={units} disabled={readOnly} errors={issues} />
    </Section>
  );
}

