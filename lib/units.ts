/** Exact conversion factors (International yard and pound agreement, 1959; NIST SP 811). */
export const M_PER_IN = 0.0254;
export const M_PER_FT = 0.3048;
export const KG_PER_LB = 0.45359237;
/** Standard gravity, 3rd CGPM (1901). */
export const G = 9.80665;
/** 1 psf in Pa: 1 lbf / ft² = KG_PER_LB·G / M_PER_FT². */
export const PA_PER_PSF = (KG_PER_LB * G) / (M_PER_FT * M_PER_FT);

export type UnitSystem = 'imperial' | 'metric';

export const ftToM = (ft: number) => ft * M_PER_FT;
export const mToFt = (m: number) => m / M_PER_FT;
export const inToM = (inch: number) => inch * M_PER_IN;
export const mToIn = (m: number) => m / M_PER_IN;
export const lbToKg = (lb: number) => lb * KG_PER_LB;
export const kgToLb = (kg: number) => kg / KG_PER_LB;
export const kgToKn = (kg: number) => (kg * G) / 1000;
export const knToKg = (kn: number) => (kn * 1000) / G;
export const kpaToPsf = (kpa: number) => (kpa * 1000) / PA_PER_PSF;
export const psfToKpa = (psf: number) => (psf * PA_PER_PSF) / 1000;
export const m2ToFt2 = (m2: number) => m2 / (M_PER_FT * M_PER_FT);
export const ft2ToM2 = (ft2: number) => ft2 * M_PER_FT * M_PER_FT;
