import type { UnitSystem } from '@/lib/units';
import { formatForce, formatLength, formatMass, formatPressure } from './quantity';

/**
 * A figure in the viewer's units with the other system in brackets, for documents that travel (the plan
 * PDF): "41′ 0″ (12.50 m)" for an imperial viewer, "12.50 m (41′ 0″)" for a metric one.
 */
const other = (u: UnitSystem): UnitSystem => (u === 'imperial' ? 'metric' : 'imperial');
const both = (f: (v: number, u: UnitSystem) => string) => (v: number, u: UnitSystem) => `${f(v, u)} (${f(v, other(u))})`;

export const dualLength = both(formatLength);
export const dualMass = both(formatMass);
export const dualPressure = both(formatPressure);
export const dualForce = both(formatForce);

/** Area: ft² or m², with the other in brackets. */
export function dualArea(m2: number, units: UnitSystem): string {
  const m = `${m2.toFixed(2)} m²`;
  const ft = `${(m2 / 0.09290304).toFixed(1)} ft²`;
  return units === 'metric' ? `${m} (${ft})` : `${ft} (${m})`;
}

/** Wind speed: mph or m/s (1 mph = 0.44704 m/s exactly), the other in brackets. */
export function dualSpeed(ms: number, units: UnitSystem): string {
  const mph = `${(ms / 0.44704).toFixed(0)} mph`;
  const si = `${ms.toFixed(1)} m/s`;
  return units === 'metric' ? `${si} (${mph})` : `${mph} (${si})`;
}
