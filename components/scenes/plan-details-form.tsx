'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useId, useState, type ComponentProps } from 'react';
import { useLeaveGuard } from '@/components/use-leave-guard';
import { Controller, useFieldArray, useForm, type UseFormRegisterReturn } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FieldFrame, TextField, controlClasses } from '@/components/ui/field';
import { SelectField } from '@/components/ui/select';
import { Notice } from '@/components/ui/notice';
import { ApiError, fetchJson } from '@/lib/client/fetch-json';
import { DETAIL_LIMITS, WEIGHT_SOURCES, WEIGHT_SOURCE_WORDS, planDetailsSchema, type PlanDetails, type PlanDetailsIn } from '@/lib/plan-details/schema';
import type { UnitSystem } from '@/lib/units';

/** 1 mph = 0.44704 m/s exactly (1 mile = 1609.344 m). */
const MS_PER_MPH = 0.44704;

interface Props {
  sceneId: number;
  revision: number;
  details: PlanDetails;
  units: UnitSystem;
  /** False: shown read-only (not the owner, or not an operator, or the plan is frozen). */
  canEdit: boolean;
  /** Why the form is read-only, when it is for another reason than ownership (a submitted or approved plan). */
  readOnlyNote?: string;
}

type Outcome = { kind: 'saved'; revision: number } | { kind: 'conflict'; current: number | null } | { kind: 'error'; message: string } | null;

function TextArea({ label, error, reg, rows = 3, ...rest }: { label: string; error?: string; reg: UseFormRegisterReturn; rows?: number } & Omit<ComponentProps<'textarea'>, 'id'>) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} error={error}>
      <textarea id={id} rows={rows} aria-invalid={error ? true : undefined} className={controlClasses(!!error)} {...reg} {...rest} />
    </FieldFrame>
  );
}

function Check({ label, reg, disabled }: { label: string; reg: UseFormRegisterReturn; disabled: boolean }) {
  return (
    <label className="flex min-h-touch items-center gap-3 text-body">
      <input type="checkbox" className="h-5 w-5 accent-teal" disabled={disabled} {...reg} />
      {label}
    </label>
  );
}

const Section = ({ title, children }: { title: string; children: React.ReactNode }) => (
  <fieldset className="flex flex-col gap-4 border-t-2 border-paper-edge pt-4">
    <legend className="pr-3 text-title font-semibold text-ink">{title}</legend>
    {children}
  </fieldset>
);

/** The plan details form: react-hook-form over the same zod schema the route parses with. Saving makes a new revision. */
export function PlanDetailsForm({ sceneId, revision, details, units, canEdit, readOnlyNote }: Props) {
  const router = useRouter();
  const [base, setBase] = useState(revision);
  const [outcome, setOutcome] = useState<Outcome>(null);
  const [saving, setSaving] = useState(false);
  const { register, handleSubmit, control, formState, reset } = useForm<PlanDetailsIn, unknown, PlanDetails>({ resolver: zodResolver(planDetailsSchema), defaultValues: details });
  const hazards = useFieldArray({ control, name: 'hazards' });
  const checklist = useFieldArray({ control, name: 'checklist' });
  const e = formState.errors;
  const off = !canEdit;
  useLeaveGuard(canEdit && formState.isDirty && !saving);

  const onSubmit = handleSubmit(async (v) => {
    setOutcome(null);
    setSaving(true);
    try {
      const saved = await fetchJson<{ revision: number }>(`/api/scenes/${sceneId}/details`, { method: 'PUT', body: JSON.stringify({ revision: base, details: v }) });
      setBase(saved.revision);
      reset(v as PlanDetailsIn);
      setOutcome({ kind: 'saved', revision: saved.revision });
      router.refresh();
    } catch (err) {
      if (err instanceof ApiError && err.status === 409) setOutcome({ kind: 'conflict', current: typeof err.body.currentRevision === 'number' ? err.body.currentRevision : null });
      else setOutcome({ kind: 'error', message: (err as Error).message });
    } finally {
      setSaving(false);
    }
  });

  const max = (n: number) => ({ maxLength: n, disabled: off });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label="Plan details">
      {outcome?.kind === 'saved' && <Notice tone="success" title={`Saved as revision ${outcome.revision}`} />}
      {outcome?.kind === 'error' && (
        <Notice tone="error" title="Not saved">
          {outcome.message}
        </Notice>
      )}
      {outcome?.kind === 'conflict' && (
        <Notice tone="warning" title="The scene was saved after you opened this page">
          You opened revision {base}
          {outcome.current ? `; it is now at revision ${outcome.current}` : ''}. Nothing was overwritten. Reload the page, then enter the details again.
        </Notice>
      )}
      <Section title="Job">
        <div className="grid gap-4 md:grid-cols-2">
          <TextField label="Customer" error={e.job?.customer?.message} {...max(DETAIL_LIMITS.short)} {...register('job.customer')} />
          <TextField label="Job reference" error={e.job?.reference?.message} {...max(DETAIL_LIMITS.name)} {...register('job.reference')} />
          <TextField label="Location" error={e.job?.location?.message} {...max(DETAIL_LIMITS.medium)} {...register('job.location')} />
          <TextField label="Date and time (site local)" type="datetime-local" error={e.job?.when?.message} disabled={off} {...register('job.when')} />
        </div>
      </Section>
      <Section title="Load weight">
        <TextArea label="Load description" error={e.load?.description?.message} reg={register('load.description')} {...max(DETAIL_LIMITS.medium)} rows={2} />
        <SelectField label="How the weight is known" disabled={off} {...register('load.weightSource')}>
          {WEIGHT_SOURCES.map((w) => (
            <option key={w} value={w}>
              {WEIGHT_SOURCE_WORDS[w]}
            </option>
          ))}
        </SelectField>
        <TextArea label="The figures behind it (ticket, manifest line, dimensions)" error={e.load?.weightBasis?.message} reg={register('load.weightBasis')} {...max(DETAIL_LIMITS.medium)} rows={2} />
      </Section>
      <Section title="People and communication">
        <div className="grid gap-4 md:grid-cols-2">
          <TextField label="Lift director" error={e.people?.liftDirector?.message} {...max(DETAIL_LIMITS.name)} {...register('people.liftDirector')} />
          <TextField label="Operator" error={e.people?.operator?.message} {...max(DETAIL_LIMITS.name)} {...register('people.operator')} />
          <TextField label="Spotter" error={e.people?.spotter?.message} {...max(DETAIL_LIMITS.name)} {...register('people.spotter')} />
          <TextField label="Signal person" error={e.people?.signalPerson?.message} {...max(DETAIL_LIMITS.name)} {...register('people.signalPerson')} />
          <TextField label="Radio channel" error={e.communication?.radioChannel?.message} {...max(DETAIL_LIMITS.name)} {...register('communication.radioChannel')} />
          <Check label="Hand signals in use" disabled={off} reg={register('communication.handSignals')} />
        </div>
        <TextArea label="Communication notes" error={e.communication?.notes?.message} reg={register('communication.notes')} {...max(DETAIL_LIMITS.medium)} rows={2} />
      </Section>
      <Section title="Site control and weather">
        <TextArea label="Traffic control" error={e.siteControl?.traffic?.message} reg={register('siteControl.traffic')} {...max(DETAIL_LIMITS.medium)} rows={2} />
        <div className="grid gap-4 md:grid-cols-2">
          <TextField label="Lane closed" error={e.siteControl?.laneClosed?.message} {...max(DETAIL_LIMITS.short)} {...register('siteControl.laneClosed')} />
          <Check label="Police on scene" disabled={off} reg={register('siteControl.policeOnScene')} />
          <TextField label="Weather" error={e.weather?.conditions?.message} {...max(DETAIL_LIMITS.medium)} {...register('weather.conditions')} />
          <Controller
            control={control}
            name="weather.windLimit"
            render={({ field, fieldState }) => (
              <TextField
                label={`Stop the lift above a wind of (${units === 'metric' ? 'm/s' : 'mph'})`}
                inputMode="decimal"
                disabled={off}
                error={fieldState.error?.message}
                defaultValue={field.value === null || field.value === undefined ? '' : String(Math.round((field.value / (units === 'metric' ? 1 : MS_PER_MPH)) * 10) / 10)}
                onChange={(ev) => {
                  const t = ev.target.value.trim();
                  const n = Number(t);
                  field.onChange(t === '' ? null : Number.isFinite(n) ? n * (units === 'metric' ? 1 : MS_PER_MPH) : NaN);
                }}
                onBlur={field.onBlur}
              />
            )}
          />
        </div>
      </Section>
      <Section title="Hazards and controls">
        {hazards.fields.map((f, i) => (
          <div key={f.id} className="grid gap-3 rounded-plate border-2 border-paper-edge p-3 md:grid-cols-[1fr_1fr_auto]">
            <TextArea label={`Hazard ${i + 1}`} error={e.hazards?.[i]?.hazard?.message} reg={register(`hazards.${i}.hazard`)} {...max(DETAIL_LIMITS.medium)} rows={2} />
            <TextArea label="Its control" error={e.hazards?.[i]?.control?.message} reg={register(`hazards.${i}.control`)} {...max(DETAIL_LIMITS.medium)} rows={2} />
            {canEdit && (
              <Button variant="quiet" className="self-end" onClick={() => hazards.remove(i)}>
                Remove
              </Button>
            )}
          </div>
        ))}
        {canEdit && hazards.fields.length < DETAIL_LIMITS.hazards && (
          <Button variant="secondary" className="self-start" onClick={() => hazards.append({ hazard: '', control: '' })}>
            Add a hazard
          </Button>
        )}
      </Section>
      <Section title="Contingency and emergency">
        <TextArea label="Contingency" error={e.contingency?.message} reg={register('contingency')} {...max(DETAIL_LIMITS.long)} />
        <TextArea label="Emergency action plan" error={e.emergencyPlan?.message} reg={register('emergencyPlan')} {...max(DETAIL_LIMITS.long)} />
      </Section>
      <Section title="Pre-lift checklist">
        {checklist.fields.map((f, i) => (
          <div key={f.id} className="flex items-end gap-3">
            <input type="checkbox" aria-label={`Item ${i + 1} done`} className="mb-3 h-5 w-5 accent-teal" disabled={off} {...register(`checklist.${i}.done`)} />
            <TextField label={`Item ${i + 1}`} frameClassName="flex-1" error={e.checklist?.[i]?.item?.message} {...max(DETAIL_LIMITS.short * 2)} {...register(`checklist.${i}.item`)} />
            {canEdit && (
              <Button variant="quiet" onClick={() => checklist.remove(i)}>
                Remove
              </Button>
            )}
          </div>
        ))}
        {canEdit && checklist.fields.length < DETAIL_LIMITS.checklist && (
          <Button variant="secondary" className="self-start" onClick={() => checklist.append({ item: '', done: false })}>
            Add a checklist item
          </Button>
        )}
      </Section>
      {canEdit ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" variant="primary" size="lg" disabled={saving}>
            {saving ? 'Saving…' : 'Save plan details'}
          </Button>
          <p className="text-caption text-ink-muted">Saving makes a new revision of the scene; this page loaded revision {base}.</p>
        </div>
      ) : (
        <p className="text-body text-ink-muted">{readOnlyNote ?? 'Only the scene’s owner can change its plan details.'}</p>
      )}
    </form>
  );
}
