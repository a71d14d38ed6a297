'use client';
import { useState } from 'react';
import { kgToLb, type UnitSystem } from '@/lib/units';
import { formatNumber } from '@/lib/format/number';
import { parseLength, parseMass, parseNumber } from '@/lib/format/parse';
import { formatFeetInches } from '@/lib/format/quantity';

interface FieldProps<T> {
  label: string;
  value: T;
  onCommit(v: T): void;
  disabled?: boolean;
  hint?: string;
  testId?: string;
}

/** A text box that shows a formatted value and commits the parsed one on Enter or leaving the field. */
function ParsedField<T>({ label, value, onCommit, disabled, hint, testId, format, parse, suffix }: FieldProps<T> & { format(v: T): string; parse(s: string): T | null; suffix?: string }) {
  const [text, setText] = useState(format(value));
  const [bad, setBad] = useState(false);
  // A new value from outside (undo, another field) replaces what is typed: adjusted while rendering.
  const [shown, setShown] = useState(value);
  if (!Object.is(shown, value)) {
    setShown(value);
    setText(format(value));
    setBad(false);
  }
  const commit = () => {
    const v = parse(text);
    if (v === null) return setBad(true);
    setBad(false);
    if (format(v) !== format(value)) onCommit(v);
    else setText(format(value));
  };
  const id = `f-${label.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <div className="flex items-center gap-1">
        <input
          id={id}
          data-testid={testId}
          value={text}
          disabled={disabled}
          aria-invalid={bad}
          onChange={(e) => setText(e.target.value)}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key === 'Enter') commit();
            if (e.key === 'Escape') setText(format(value));
          }}
          className={`min-h-11 w-full rounded-md border bg-paper-raised px-2 text-sm tabular-nums disabled:bg-paper-sunk ${bad ? 'border-over' : 'border-paper-line'}`}
        />
        {suffix && <span className="text-xs text-ink-muted">{suffix}</span>}
      </div>
      {bad && <span className="text-xs text-over">Not a value this field reads{hint ? ` (${hint})` : ''}</span>}
    </div>
  );
}

export function LengthField(p: FieldProps<number> & { units: UnitSystem; min?: number }) {
  const metric = p.units === 'metric';
  return (
    <ParsedField
      {...p}
      hint={metric ? 'metres, e.g. 4.25' : `feet and inches, e.g. 14' 6"`}
      suffix={metric ? 'm' : undefined}
      format={(v) => (metric ? formatNumber(v, 2) : formatFeetInches(v))}
      parse={(s) => {
        const v = parseLength(s, p.units);
        return v === null || (p.min !== undefined && v < p.min) ? null : v;
      }}
    />
  );
}

export function MassField(p: FieldProps<number> & { units: UnitSystem }) {
  const metric = p.units === 'metric';
  return (
    <ParsedField
      {...p}
      suffix={metric ? 'kg' : 'lb'}
      format={(v) => formatNumber(metric ? v : kgToLb(v))}
      parse={(s) => {
        const v = parseMass(s, p.units);
        return v === null || v < 0 ? null : v;
      }}
    />
  );
}

export function NumberField(p: FieldProps<number> & { suffix?: string; min?: number; max?: number; digits?: number }) {
  return (
    <ParsedField
      {...p}
      format={(v) => (p.digits === undefined ? String(Math.round(v * 10) / 10) : formatNumber(v, p.digits))}
      parse={(s) => {
        const v = parseNumber(s.replace(/\s*[°%]$/, ''));
        return v === null || (p.min !== undefined && v < p.min) || (p.max !== undefined && v > p.max) ? null : v;
      }}
    />
  );
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
