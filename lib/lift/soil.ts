import { G, psfToKpa } from '@/lib/units';

/**
 * Presumptive allowable bearing values, International Building Code (2012 and later), Table 1806.2
 * "Presumptive load-bearing values", vertical foundation pressure in psf. Offered as named choices; a
 * geotechnical assessment and local codes govern.
 */
export const IBC_1806_2 = [
  { id: 'crystalline-bedrock', label: 'Crystalline bedrock', psf: 12000 },
  { id: 'sedimentary-rock', label: 'Sedimentary and foliated rock', psf: 4000 },
  { id: 'sandy-gravel', label: 'Sandy gravel and/or gravel (GW, GP)', psf: 3000 },
  { id: 'sand', label: 'Sand, silty sand, clayey sand, silty gravel, clayey gravel (SW, SP, SM, SC, GM, GC)', psf: 2000 },
  { id: 'clay', label: 'Clay, sandy clay, silty clay, clayey silt, silt, sandy silt (CL, ML, MH, CH)', psf: 1500 },
] as const;

export type SoilClass = (typeof IBC_1806_2)[number]['id'];

export interface SoilChoice {
  id: SoilClass;
  label: string;
  psf: number;
  /** Exactly converted (1 psf = 0.45359237·9.80665/0.3048² Pa). */
  kPa: number;
}

export const SOIL_CHOICES: readonly SoilChoice[] = IBC_1806_2.map((s) => ({ ...s, kPa: psfToKpa(s.psf) }));

export function presumptiveBearing(id: SoilClass): SoilChoice {
  const found = SOIL_CHOICES.find((s) => s.id === id);
  if (!found) throw new Error(`Unknown soil class ${id}`);
  return found;
}

/**
 * Area of mat needed under a pad: (P + W_mat) / q_allowable, with P the pad reaction (kN), the mat's own
 * mass in kg and q in kPa (D. Duerr, "Effective Bearing Length of Crane Mats", 2DM Associates, 2010).
 */
export function requiredMatArea(reactionKn: number, matMassKg: number, allowableKpa: number): number {
  return (reactionKn + (matMassKg * G) / 1000) / allowableKpa;
}
