'use client';

import { createContext, useContext, type ReactNode } from 'react';
import { useController, useFormContext, type FieldValues } from 'react-hook-form';
import { TextField } from '@/components/ui/field';
import { cx } from '@/components/ui/cx';
import type { UnitSystem } from '@/lib/units';
import { UnitInput, type Quantity } from './unit-input';

export const FormUnits = createContext<{ units: UnitSystem; readOnly: boolean }>({ units: 'imperial', readOnly: false });

/** Reads a dotted path ("spec.boom.stages.1.length") out of a nested object. */
export function getPath(obj: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((o, k) => (o && typeof o === 'object' ? (o as Record<string, unknown>)[k] : undefined), obj);
}

export function useFieldError(name: string): string | undefined {
  const { formState } = useFormContext();
  const e = getPath(formState.errors, name) as { message?: string } | undefined;
  return e?.message;
}

/** A number in the user's units, bound to an SI value in the form. */
/** `optional`: an empty field is left out of the spec (the engine's documented default applies), not an error. */
export function NumField({ name, label, quantity, hint, bare, optional }: { name: string; label: string; quantity: Quantity; hint?: string; bare?: boolean; optional?: boolean }) {
  const { units, readOnly } = useContext(FormUnits);
  const { field } = useController<FieldValues>({ name });
  const error = useFieldError(name);
  const empty = optional ? undefined : NaN;
  return <UnitInput label={label} quantity={quantity} units={units} value={(field.value as number | null | undefined) ?? null} onChange={(v) => field.onChange(v === null ? empty : v)} error={error} hint={hint} disabled={readOnly} bare={bare} />;
}

export function TextInput({ name, label, hint }: { name: string; label: string; hint?: string }) {
  const { register } = useFormContext();
  const { readOnly } = useContext(FormUnits);
  return <TextField label={label} hint={hint} error={useFieldError(name)} disabled={readOnly} {...register(name)} />;
}

export function Section({ id, title, description, children }: { id: string; title: string; description?: ReactNode; children: ReactNode }) {
  return (
    <section id={id} aria-labelledby={`${id}-title`} className="scroll-mt-4 rounded-plate border border-paper-line bg-paper-raised shadow-plate">
      <header className="border-b border-paper-line px-5 py-3">
        <h2 id={`${id}-title`} className="text-heading text-ink">
          {title}
        </h2>
        {description && <p className="mt-0.5 text-caption text-ink-muted">{description}</p>}
      </header>
      <div className="space-y-4 px-5 py-4">{children}</div>
    </section>
  );
}

export function Row({ children, cols = 3, className }: { children: ReactNode; cols?: 2 | 3 | 4; className?: string }) {
  const c = { 2: 'sm:grid-cols-2', 3: 'sm:grid-cols-3', 4: 'sm:grid-cols-2 xl:grid-cols-4' }[cols];
  return <div className={cx('grid grid-cols-1 gap-3', c, className)}>{children}</div>;
}

export function SubHeading({ children }: { children: ReactNode }) {
  return <h3 className="text-label font-bold uppercase tracking-[0.08em] text-teal-dark">{children}</h3>;
}
