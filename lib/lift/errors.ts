/**
 * Typed engine failures. The engine never answers a silent pass: input it cannot analyse raises a
 * LiftError with a stable `code` (for programs) and a plain sentence (for people).
 */
export type LiftErrorCode =
  | 'invalid-input'
  | 'too-few-supports'
  | 'collinear-supports'
  | 'coincident-supports'
  | 'invalid-mass'
  | 'zero-length-boom'
  | 'degenerate-polygon'
  | 'tips-unloaded'
  | 'invalid-load-chart'
  | 'invalid-rigging';

export const LIFT_ERROR_CODES: readonly LiftErrorCode[] = [
  'invalid-input',
  'too-few-supports',
  'collinear-supports',
  'coincident-supports',
  'invalid-mass',
  'zero-length-boom',
  'degenerate-polygon',
  'tips-unloaded',
  'invalid-load-chart',
  'invalid-rigging',
];

export class LiftError extends Error {
  override readonly name = 'LiftError';
  constructor(
    readonly code: LiftErrorCode,
    message: string,
    /** Dotted path of the input field at fault, when there is one (e.g. "masses.2.mass"). */
    readonly field?: string,
  ) {
    super(message);
  }

  toJSON() {
    return { error: this.message, code: this.code, ...(this.field ? { field: this.field } : {}) };
  }
}

export const isLiftError = (e: unknown): e is LiftError => e instanceof LiftError;

/** Throws invalid-mass unless m is a finite number ≥ 0. */
export function assertMass(m: number, field: string, what: string): void {
  if (!Number.isFinite(m) || m < 0) {
    throw new LiftError('invalid-mass', `${what} has no usable mass (${Number.isFinite(m) ? 'below zero' : 'not a number'}); give a weight of zero or more.`, field);
  }
}
