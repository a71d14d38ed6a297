import type { LoadObject } from '@/lib/scene/objects';
import { loadMass } from '@/lib/scene/geometry/load';
import { formatLength, formatMass } from '@/lib/format/quantity';
import { formatNumber } from '@/lib/format/number';
import { KG_PER_LB, M_PER_FT, type UnitSystem } from '@/lib/units';
import { numberSpec } from '../field-specs';

/** 1 lb/ft³ in kg/m³, exactly (lib/units). */
const KGM3_PER_LBFT3 = KG_PER_LB / (M_PER_FT * M_PER_FT * M_PER_FT);

/** Density typed as lb/ft³ (imperial) or kg/m³, stored as kg/m³; 1 to 20,000 kg/m³ as the document allows. */
export function densitySpec(units: UnitSystem) {
  const metric = units === 'metric';
  return numberSpec({
    digits: 0,
    min: 1,
    max: 20_000,
    rangeWhy: 'a density is',
    toShown: metric ? undefined : (v) => v / KGM3_PER_LBFT3,
    fromShown: metric ? undefined : (v) => v * KGM3_PER_LBFT3,
  });
}

const shapeWords = (load: LoadObject, units: UnitSystem) => {
  const s = load.shape;
  const L = (m: number) => formatLength(m, units);
  if (s.kind === 'coil') return `a coil ${L(s.outerDiameter)} across, ${L(s.innerDiameter)} eye, ${L(s.width)} wide`;
  return `${s.kind === 'box' ? 'a box' : 'a vehicle'} ${L(s.length)} × ${L(s.width)} × ${L(s.height)}`;
};

/** "a coil 6′ 0″ across, 2′ 0″ eye, 5′ 0″ wide, solid at 490 lb/ft³ (steel) ≈ 58,719 lb": the estimate's inputs in words. */
export function estimateWords(load: LoadObject, units: UnitSystem): string {
  const metric = units === 'metric';
  const density = metric ? `${formatNumber(load.density)} kg/m³` : `${formatNumber(load.density / KGM3_PER_LBFT3)} lb/ft³`;
  const steel = Math.abs(load.density - 7850) < 1 ? ' (steel)' : '';
  return `${shapeWords(load, units)}, solid at ${density}${steel} ≈ ${formatMass(loadMass(load), units)}`;
}
