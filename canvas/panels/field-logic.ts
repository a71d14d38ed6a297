/**
 * What a numeric field shows and what it commits, as pure functions, so the field on screen and the
 * property test over the editor's commands run the same code. The rule: a field never shows a figure the
 * plan does not use. Text that cannot be read, or a value outside the field's range, is either refused
 * (the field goes back to the plan's value and says why, naming the range) or clamped (the field shows
 * the clamped value with a notice).
 */

export interface FieldSpec {
  /** SI value → the text in the box (no unit when `unit` is shown beside it). */
  format(si: number): string;
  /** Typed text → SI value, or null when it cannot be read. */
  parse(text: string): number | null;
  /** How to type a value, for the "cannot read" message. */
  hint: string;
  /** Written beside the box and after figures in messages ("m", "lb", "°"); feet-inches carry their own. */
  unit?: string;
  /** Inclusive range, SI. */
  min?: number;
  max?: number;
  /** 'clamp' keeps the nearest value in range and says so; 'refuse' (the default) keeps the plan's value. */
  outOfRange?: 'refuse' | 'clamp';
  /** Why the range is what it is, e.g. "this leg reaches". */
  rangeWhy?: string;
  /** Brings a read value into the stored form (e.g. an angle into 0–360) before the range applies. */
  normalise?(si: number): number;
}

export interface FieldMessage {
  tone: 'error' | 'notice';
  text: string;
}

export interface FieldState {
  text: string;
  /** The plan's value the text was last set from. */
  shown: number;
  /** That value as the field's spec wrote it (a change of units rewrites the text). */
  formatted: string;
  /** A commit just went out: take the plan's next value as it comes, keeping the message. */
  pending: boolean;
  message: FieldMessage | null;
}

export const withUnit = (spec: FieldSpec, si: number) => (spec.unit ? `${spec.format(si)} ${spec.unit}` : spec.format(si));

export function rangeWords(spec: FieldSpec): string {
  const { min, max } = spec;
  if (min !== undefined && max !== undefined) return `${spec.format(min)} – ${withUnit(spec, max)}`;
  if (min !== undefined) return `at least ${withUnit(spec, min)}`;
  if (max !== undefined) return `at most ${withUnit(spec, max)}`;
  return '';
}

export const initialField = (spec: FieldSpec, value: number): FieldState => ({ text: spec.format(value), shown: value, formatted: spec.format(value), pending: false, message: null });

/**
 * The plan's value as the field sees it on each render: a new value (or the same value in other units)
 * replaces whatever was typed.
 */
export function syncField(state: FieldState, spec: FieldSpec, value: number): FieldState {
  const formatted = spec.format(value);
  if (!state.pending && Object.is(state.shown, value) && state.formatted === formatted) return state;
  return { text: formatted, shown: value, formatted, pending: false, message: state.pending ? state.message : null };
}

export const typeInField = (state: FieldState, text: string): FieldState => ({ ...state, text });

/** Escape: back to the plan's value. */
export const revertField = (state: FieldState, spec: FieldSpec, value: number): FieldState => ({ ...state, text: spec.format(value), message: null });

/**
 * Enter or leaving the field. Answers the next field state and, when the plan should change, the SI value
 * to commit. The state is always the plan's value as text (the value to be committed, once it lands).
 */
export function commitField(state: FieldState, spec: FieldSpec, value: number): { state: FieldState; commit?: number } {
  const typed = state.text.trim();
  const keep = (message: FieldMessage | null): { state: FieldState } => ({ state: { ...initialField(spec, value), message } });
  const read = spec.parse(typed);
  if (read === null || !Number.isFinite(read)) {
    return keep({ tone: 'error', text: `“${typed}” is not a value this field reads (${spec.hint}); kept ${withUnit(spec, value)}.` });
  }
  let v = spec.normalise ? spec.normalise(read) : read;
  let message: FieldMessage | null = null;
  const below = spec.min !== undefined && v < spec.min;
  const above = spec.max !== undefined && v > spec.max;
  if (below || above) {
    const range = `${spec.rangeWhy ?? 'this field takes'} ${rangeWords(spec)}`;
    if (spec.outOfRange !== 'clamp') return keep({ tone: 'error', text: `${typed} is out of range: ${range}. Kept ${withUnit(spec, value)}.` });
    v = below ? spec.min! : spec.max!;
    message = { tone: 'notice', text: `Set to ${withUnit(spec, v)}, not ${typed}: ${range}.` };
  }
  if (spec.format(v) === spec.format(value)) return keep(message);
  return { state: { text: spec.format(v), shown: value, formatted: spec.format(value), pending: true, message }, commit: v };
}
