/**
 * Load-weight estimates from dimensions. Carbon steel ≈ 7 850 kg/m³ (handbook value, e.g. Machinery's
 * Handbook; Engineering ToolBox "Metals and Alloys – Densities").
 */
export const STEEL_DENSITY = 7850;

/** A steel coil as a hollow cylinder: W = ρ·π/4·(OD² − ID²)·width (m, kg). */
export function coilMass(outsideDiameter: number, insideDiameter: number, width: number, density = STEEL_DENSITY): number {
  if (!(outsideDiameter > insideDiameter && insideDiameter >= 0 && width > 0 && density > 0)) {
    throw new RangeError('A coil needs outside diameter > inside diameter ≥ 0, a positive width and a positive density.');
  }
  return ((density * Math.PI) / 4) * (outsideDiameter ** 2 - insideDiameter ** 2) * width;
}

/** A solid box of one material (m, kg/m³ → kg). */
export function boxMass(length: number, width: number, height: number, density: number): number {
  if (!(length > 0 && width > 0 && height > 0 && density > 0)) throw new RangeError('A box needs positive dimensions and density.');
  return length * width * height * density;
}

/** The upper weight for an estimate known to within ±uncertainty percent. */
export function upperWeight(mass: number, uncertaintyPercent: number): number {
  return mass * (1 + uncertaintyPercent / 100);
}
