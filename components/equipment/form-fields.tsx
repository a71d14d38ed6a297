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

/**
 * Which sections of a long form are open, and which field paths belong to each (for the "needs attention"
 * count on a closed one). Without a provider every section is open and cannot be closed.
 */
export const SectionState = createContext<{ isOpen: (id: string) => boolean; toggle: (id: string) => void; prefixes: Record<string, readonly string[]> } | null>(null);

/** Flattens react-hook-form's nested errors under `prefix` into path/message pairs. */
export function collectIssues(errors: unknown, prefix: string): { path: string; message: string }[] {
  const out: { path: string; message: string }[] = [];
  const walk = (node: unknown, path: string) => {
    if (!node || typeof node !== 'object') return;
    const n = node as { message?: unknown; type?: unknown };
    if (typeof n.message === 'string' && n.type !== undefined) out.push({ path, message: n.message });
    for (const [k, v] of Object.entries(node)) if (k !== 'ref' && k !== 'message' && k !== 'type' && k !== 'types') walk(v, path ? `${path}.${k}` : k);
  };
  walk(prefix ? getPath(errors, prefix) : errors, prefix);
  return out;
}

export const pathIn = (path: string, prefixes: readonly string[]) => prefixes.some((p) => path === p || path.startsWith(`${p}.`));

/**
 * A titled card. Inside a SectionState it collapses: the header is a button, and a closed section keeps
 * its fields mounted (hidden), so their values and validation stay in the form.
 */
export function Section({ id, title, description, children }: { id: string; title: string; description?: ReactNode; children: ReactNode }) {
  const state = useContext(SectionState);
  const { formState } = useFormContext();
  const open = state ? state.isOpen(id) : true;
  const problems = state && !open ? collectIssues(formState.errors, '').filter((i) => pathIn(i.path, state.prefixes[id] ?? [])).length : 0;
  const description_ = description && <p className="mt-0.5 text-caption text-ink-muted">{description}</p>;
  return (
    <section id={id} aria-labelledby={`${id}-title`} className="scroll-mt-4 rounded-plate border border-paper-line bg-paper-raised shadow-plate" data-open={open}>
      {state ? (
        // The accordion pattern: a button inside the heading, naming the section and saying whether it is open.
        <header className={cx('flex items-start gap-3 px-5 py-2', open && 'border-b border-paper-line')}>
          <div className="min-w-0 flex-1">
            <h2 id={`${id}-title`} className="text-heading text-ink">
              <button type="button" aria-expanded={open} aria-controls={`${id}-body`} onClick={() => state.toggle(id)} className="-mx-2 flex min-h-touch w-full items-center gap-2 rounded-plate px-2 text-left hover:bg-paper-sunk">
                <span aria-hidden className={cx('inline-block text-[0.75em] text-ink-soft transition-transform', open && 'rotate-90')}>
                  ▶
                </span>
                {title}
              </button>
            </h2>
            {description_}
          </div>
          {problems > 0 && (
            <span className="mt-2.5 shrink-0 rounded-full bg-over px-2.5 py-0.5 text-caption font-bold text-white">
              {problems} to fix
            </span>
          )}
        </header>
      ) : (
        <header className="border-b border-paper-line px-5 py-3">
          <h2 id={`${id}-title`} className="text-heading text-ink">
            {title}
          </h2>
          {description_}
        </header>
      )}
      <div id={`${id}-body`} hidden={!open} className="space-y-4 px-5 py-4">
        {children}
      </div>
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
