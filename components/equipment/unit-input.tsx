'use client';

import { useId, useState } from 'react';
import { FieldFrame, controlClasses, describedBy } from '@/components/ui/field';
import { cx } from '@/components/ui/cx';
import { inToM, kgToLb, mToIn, type UnitSystem } from '@/lib/units';
import { parseLength, parseMass, parseNumber } from '@/lib/format/parse';
import { formatFeetInches } from '@/lib/format/quantity';

export type Quantity = 'length' | 'diameter' | 'mass' | 'angle' | 'fraction' | 'count' | 'area';

/** Display text for an SI value in the user's units. */
export function displayValue(q: Quantity, si: number | null | undefined, units: UnitSystem): string {
  if (si === null || si === undefined || !Number.isFinite(si)) return '';
  if (q === 'length') return units === 'metric' ? String(Math.round(si * 1000) / 1000) : formatFeetInches(si);
  if (q === 'mass') return units === 'metric' ? String(Math.round(si)) : String(Math.round(kgToLb(si)));
  // Rope diameters: millimetres or inches, to 1/1000 in.
  if (q === 'diameter') return units === 'metric' ? String(Math.round(si * 10000) / 10) : String(Math.round(mToIn(si) * 1000) / 1000);
  return String(si);
}

/** Parses what the user typed back into SI; null for blank, NaN for unreadable. */
export function parseValue(q: Quantity, text: string, units: UnitSystem): number | null {
  const t = text.trim();
  if (t === '') return null;
  if (q === 'length') return parseLength(t, units) ?? NaN;
  if (q === 'mass') return parseMass(t, units) ?? NaN;
  const n = parseNumber(t);
  if (n === null) return NaN;
  if (q === 'diameter') return units === 'metric' ? n / 1000 : inToM(n);
  return n;
}

export const unitLabel = (q: Quantity, units: UnitSystem) =>
  ({ length: units === 'metric' ? 'm' : 'ft-in', diameter: units === 'metric' ? 'mm' : 'in', mass: units === 'metric' ? 'kg' : 'lb', angle: '°', fraction: '0–1', count: '', area: 'm²' })[q];

interface Props {
  label: string;
  quantity: Quantity;
  units: UnitSystem;
  value: number | null | undefined;
  onChange: (si: number | null) => void;
  error?: string;
  hint?: string;
  disabled?: boolean;
  className?: string;
  /** For a table cell: no visible label (it is still the accessible name). */
  bare?: boolean;
}

/**
 * A number field that shows its value in the user's units and hands SI back. The text the user types is
 * kept as typed, so an untouched value keeps its exact SI figure (no ft-in rounding on save).
 */
export function UnitInput({ label, quantity, units, value, onChange, error, hint, disabled, className, bare }: Props) {
  const id = useId();
  const [text, setText] = useState(() => displayValue(quantity, value, units));
  const [focused, setFocused] = useState(false);
  // Out of the field, a new value, unit system or leaving the field shows the value afresh (adjusted while rendering).
  const key = focused ? 'typing' : `${quantity}|${units}|${value}`;
  const [lastKey, setLastKey] = useState(key);
  if (key !== lastKey) {
    setLastKey(key);
    if (!focused) setText(displayValue(quantity, value, units));
  }
  const unit = unitLabel(quantity, units);
  const input = (
    <div className="relative">
      <input
        id={id}
        aria-label={bare ? label : undefined}
        aria-invalid={error ? true : undefined}
        aria-describedby={bare ? undefined : describedBy(id, hint, error)}
        inputMode={quantity === 'length' && units === 'imperial' ? 'text' : 'decimal'}
        disabled={disabled}
        value={text}
        onFocus={() => setFocused(true)}
        onBlur={() => {
          setFocused(false);
          setText(displayValue(quantity, value, units));
        }}
        onChange={(e) => {
          setText(e.target.value);
          const v = parseValue(quantity, e.target.value, units);
          onChange(v === null ? null : v);
        }}
        className={cx(controlClasses(!!error), unit && 'pr-12', 'tabular-nums disabled:bg-paper-sunk disabled:text-ink-soft', className)}
      />
      {unit && <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-caption text-ink-muted">{unit}</span>}
    </div>
  );
  if (bare) return input;
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      {input}
    </FieldFrame>
  );
}
