'use client';
import { useState } from 'react';
import type { UnitSystem } from '@/lib/units';
import { commitField, initialField, revertField, syncField, typeInField, type FieldSpec, type FieldState } from './field-logic';
import { lengthSpec, massSpec, numberSpec } from './field-specs';

interface FieldProps<T> {
  label: string;
  value: T;
  onCommit(v: T): void;
  disabled?: boolean;
  testId?: string;
}

/**
 * A text box that shows the plan's value and commits the parsed one on Enter or leaving the field. The
 * rules (range refused or clamped, with a message) are in field-logic.ts.
 */
export function SpecField({ label, value, onCommit, disabled, testId, spec }: FieldProps<number> & { spec: FieldSpec }) {
  const [raw, setState] = useState<FieldState>(() => initialField(spec, value));
  // A new value from outside (undo, another field, this field's own commit) replaces what is typed: adjusted while rendering.
  const state = syncField(raw, spec, value);
  if (state !== raw) setState(state);
  const commit = () => {
    const r = commitField(state, spec, value);
    setState(r.state);
    if (r.commit !== undefined) onCommit(r.commit);
  };
  const id = `f-${label.replace(/\W+/g, '-').toLowerCase()}`;
  const msg = state.message;
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <div className="flex items-center gap-1">
        <input
          id={id}
          data-testid={testId}
          value={state.text}
          disabled={disabled}
          aria-invalid={msg?.tone === 'error'}
          aria-describedby={msg ? `${id}-msg` : undefined}
          onChange={(e) => setState(typeInField(state, e.target.value))}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') commit();
            if (e.key === 'Escape') setState(revertField(state, spec, value));
          }}
          className={`min-h-11 w-full min-w-0 rounded-md border bg-paper-raised px-2 text-sm tabular-nums disabled:bg-paper-sunk ${msg?.tone === 'error' ? 'border-over' : msg ? 'border-signal-dark' : 'border-paper-line'}`}
        />
        {spec.unit && <span className="text-xs text-ink-muted">{spec.unit}</span>}
      </div>
      {msg && (
        <span id={`${id}-msg`} role={msg.tone === 'error' ? 'alert' : 'status'} data-testid={testId ? `${testId}-message` : undefined} className={`text-xs ${msg.tone === 'error' ? 'text-over' : 'rounded bg-signal-light px-1 text-ink'}`}>
          {msg.text}
        </span>
      )}
    </div>
  );
}

type Ranged = { min?: number; max?: number; clamp?: boolean; rangeWhy?: string };
const range = (p: Ranged) => ({ min: p.min, max: p.max, outOfRange: p.clamp ? ('clamp' as const) : ('refuse' as const), rangeWhy: p.rangeWhy });

export function LengthField(p: FieldProps<number> & Ranged & { units: UnitSystem }) {
  return <SpecField {...p} spec={lengthSpec(p.units, range(p))} />;
}

export function MassField(p: FieldProps<number> & Ranged & { units: UnitSystem }) {
  return <SpecField {...p} spec={massSpec(p.units, { ...range(p), min: p.min ?? 0 })} />;
}

export function NumberField(p: FieldProps<number> & Ranged & { suffix?: string; digits?: number }) {
  return <SpecField {...p} spec={numberSpec({ ...range(p), unit: p.suffix, digits: p.digits })} />;
}

export function SelectField<T extends string>({ label, value, options, onCommit, disabled, testId }: { label: string; value: T; options: { value: T; label: string }[]; onCommit(v: T): void; disabled?: boolean; testId?: string }) {
  const id = `s-${label.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <select id={id} data-testid={testId} value={value} disabled={disabled} onChange={(e) => onCommit(e.target.value as T)} className="min-h-11 rounded-md border border-paper-line bg-paper-raised px-2 text-sm">
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}

export function TextField({ label, value, onCommit, disabled, multiline }: FieldProps<string> & { multiline?: boolean }) {
  const [text, setText] = useState(value);
  const [shown, setShown] = useState(value);
  if (shown !== value) {
    setShown(value);
    setText(value);
  }
  const id = `t-${label.replace(/\W+/g, '-').toLowerCase()}`;
  const common = { id, value: text, disabled, onChange: (e: React.ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => setText(e.target.value), onBlur: () => text !== value && onCommit(text), className: 'w-full rounded-md border border-paper-line bg-paper-raised px-2 py-2 text-sm' };
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      {multiline ? <textarea rows={3} {...common} /> : <input {...common} className={`${common.className} min-h-11`} />}
    </div>
  );
}
