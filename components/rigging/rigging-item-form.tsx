'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useLeaveGuard } from '@/components/use-leave-guard';
import { Controller, useForm, useWatch, type Resolver } from 'react-hook-form';
import { RIGGING_KINDS, RIGGING_STATUSES } from '@/lib/domain';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select';
import { ApiError, fetchJson } from '@/lib/client/fetch-json';
import { LIFTING_CHAIN_CHOICES, ROUND_SLING_COLOURS, SHACKLE_SIZES, standardRating } from '@/lib/equipment/rigging-ratings';
import { liftingUse } from '@/lib/lift/ratings/lifting-use';
import { riggingItemSchema, type RiggingItemInput } from '@/lib/validations/rigging';
import { type UnitSystem } from '@/lib/units';
import { formatMass } from '@/lib/format/quantity';
import { UnitInput } from '@/components/equipment/unit-input';
import { KIND_LABEL, STATUS_LABEL } from './labels';

/** Add or edit a rigging item. Ratings come from a built-in table where one applies, unless entered by hand. */
export function RiggingItemForm({ initial, id, units, readOnly }: { initial: RiggingItemInput; id?: number; units: UnitSystem; readOnly: boolean }) {
  const router = useRouter();
  const { control, register, handleSubmit, setValue, setError, formState, reset } = useForm<RiggingItemInput>({ defaultValues: initial, resolver: zodResolver(riggingItemSchema) as Resolver<RiggingItemInput> });
  const kind = useWatch({ control, name: 'kind' });
  const size = useWatch({ control, name: 'size' }) ?? '';
  const std = standardRating(kind, size);
  // Say why before the save is refused; a size not chosen yet is not a refusal.
  const refusal = kind === 'recovery-strap' || size ? liftingUse(kind, size) : null;
  const r = initial.ratings;
  const [manual, setManual] = useState(!!id && !!r && r.vertical !== null && !(std && Math.abs((r.vertical ?? 0) - std.vertical) < 0.01));
  const [serverError, setServerError] = useState<string | null>(null);
  useLeaveGuard(!readOnly && formState.isDirty && !formState.isSubmitting);
  const err = (p: string) => (formState.errors as Record<string, { message?: string } | undefined>)[p]?.message;
  const ratingErr = (formState.errors.ratings as { vertical?: { message?: string } } | undefined)?.vertical?.message;

  const onSubmit = handleSubmit(async (values) => {
    setServerError(null);
    const body = manual ? values : { ...values, ratings: { vertical: null, choker: null, basket: null } };
    try {
      const saved = await fetchJson<{ id: number }>(id ? `/api/rigging/${id}` : '/api/rigging', { method: id ? 'PUT' : 'POST', body: JSON.stringify(body) });
      reset(values);
      router.push(`/rigging/${saved.id}?saved=1`);
      router.refresh();
    } catch (e) {
      if (e instanceof ApiError) {
        setServerError(e.message);
        for (const i of e.body.issues ?? []) setError(i.path as never, { type: 'server', message: i.message });
      } else setServerError('Could not reach the server');
    }
  });

  const sizeField =
    kind === 'round-sling' ? (
      <SelectField label="Colour (WSTDA code)" disabled={readOnly} {...register('size')}>
        <option value="">Choose a colour</option>
        {ROUND_SLING_COLOURS.map((c) => (
          <option key={c} value={c}>
            {c}
          </option>
        ))}
      </SelectField>
    ) : kind === 'shackle' ? (
      <SelectField label="Shackle size (in)" disabled={readOnly} {...register('size')}>
        <option value="">Choose a size</option>
        {SHACKLE_SIZES.map((s) => (
          <option key={s} value={s}>
            {s} in
          </option>
        ))}
      </SelectField>
    ) : kind === 'chain' ? (
      <SelectField label="Chain size and grade" disabled={readOnly} {...register('size')}>
        <option value="">Choose size and grade</option>
        {LIFTING_CHAIN_CHOICES.map((v) => (
          <option key={v} value={v}>
            {v}
          </option>
        ))}
        {/* A row stored before the lifting rules keeps its size, shown as it was. */}
        {initial.kind === 'chain' && initial.size && !LIFTING_CHAIN_CHOICES.includes(initial.size) && (
          <option value={initial.size}>{initial.size} (not a lifting chain)</option>
        )}
      </SelectField>
    ) : (
      <TextField label="Size / description" disabled={readOnly} error={err('size')} {...register('size')} />
    );

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4 rounded-plate border border-paper-line bg-paper-raised p-5 shadow-plate">
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <TextField label="Tag" disabled={readOnly} error={err('tag')} {...register('tag')} />
        <SelectField label="Kind" disabled={readOnly} {...register('kind', { onChange: () => setValue('size', '') })}>
          {RIGGING_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABEL[k]}
            </option>
          ))}
        </SelectField>
        {sizeField}
        <Controller control={control} name="length" render={({ field }) => <UnitInput label="Length (blank if it does not apply)" quantity="length" units={units} value={field.value ?? null} onChange={field.onChange} disabled={readOnly} error={err('length')} />} />
      </div>
      {refusal && (
        <Notice tone="warning" title="Not lifting rigging">
          <span data-testid="form-not-lifting">{refusal.reason}</span>
          {id ? ' A row stored before this rule can be saved with its kind and size unchanged; it stays flagged.' : ' It cannot be added to the rigging inventory.'}
        </Notice>
      )}
      <fieldset className="space-y-3 rounded-plate border border-paper-line p-3">
        <legend className="px-1 text-label font-bold">Ratings by hitch</legend>
        {std && !manual && (
          <div data-testid="table-ratings" className="space-y-1">
            <p className="text-body">
              Vertical <strong>{formatMass(std.vertical, units)}</strong>
              {std.choker !== null && (
                <>
                  {' '}· choker <strong>{formatMass(std.choker, units)}</strong>
                </>
              )}
              {std.basket !== null && (
                <>
                  {' '}· basket <strong>{formatMass(std.basket, units)}</strong>
                </>
              )}
            </p>
            <p className="text-caption text-ink-muted">{std.note}</p>
          </div>
        )}
        {!std && !manual && <p className="text-body text-ink-soft">No built-in table covers this item: enter its ratings from its tag.</p>}
        {!readOnly && (
          <label className="flex min-h-touch items-center gap-3 text-body">
            <input type="checkbox" className="h-5 w-5 accent-teal" checked={manual || !std} disabled={!std} onChange={(e) => setManual(e.target.checked)} /> Enter ratings from the item&rsquo;s tag
          </label>
        )}
        {(manual || !std) && (
          <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
            {(['vertical', 'choker', 'basket'] as const).map((h) => (
              <Controller
                key={h}
                control={control}
                name={`ratings.${h}`}
                render={({ field }) => <UnitInput label={`${h[0].toUpperCase()}${h.slice(1)}`} quantity="mass" units={units} value={field.value ?? null} onChange={field.onChange} disabled={readOnly} error={h === 'vertical' ? ratingErr : undefined} />}
              />
            ))}
          </div>
        )}
      </fieldset>
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
        <SelectField label="Status" disabled={readOnly} {...register('status')}>
          {RIGGING_STATUSES.map((s) => (
            <option key={s} value={s}>
              {STATUS_LABEL[s]}
            </option>
          ))}
        </SelectField>
        <TextField type="date" label="Last inspection" disabled={readOnly} error={err('lastInspection')} {...register('lastInspection', { setValueAs: (v) => v || null })} />
        <TextField type="date" label="Next inspection due" disabled={readOnly} error={err('nextInspectionDue')} {...register('nextInspectionDue', { setValueAs: (v) => v || null })} />
      </div>
      <TextField label="Notes" disabled={readOnly} error={err('notes')} {...register('notes')} />
      {serverError && <Notice tone="error" title="Not saved">{serverError}</Notice>}
      {!readOnly && (
        <Button type="submit" variant="signal" size="lg" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? 'Saving…' : id ? 'Save item' : 'Add item'}
        </Button>
      )}
    </form>
  );
}
