import type { TruckSpec } from './truck-spec';

/**
 * A blank-ish starting outline for a new profile: round numbers so the drawing has something to show,
 * to be replaced with the truck's own figures from its manufacturer's documents. The load chart starts
 * empty and must be filled (or pasted) before the profile saves.
 */
export function starterSpec(): TruckSpec {
  const leg = (id: string, x: number, side: 1 | -1) => ({
    id,
    mount: { x, y: 0.5 * side },
    direction: 90 * side,
    stages: { retracted: 0.6, intermediate: null, full: 2.5 },
    pad: { length: 0.6, width: 0.6 },
    padRating: 10000,
  });
  return {
    specVersion: 1,
    notes: '',
    carrier: {
      length: 10,
      width: 2.5,
      tailboard: { rear: 0, front: 1, width: 2.5, top: 1.2 },
      body: { rear: 1, front: 7, width: 2.5, top: 1.5 },
      cab: { rear: 7, front: 10, width: 2.5, top: 3 },
      mass: 15000,
      cg: { x: 5.5, y: 0, z: 1 },
      stowedHeight: 3.8,
      boomStowed: { slew: 0, elevation: 0 },
    },
    upper: { slewAxis: { x: 3, y: 0 }, turret: { mass: 2500, cg: { x: 0, y: 0, z: 1.8 } }, counterweight: { mass: 0, cg: { x: -1, y: 0, z: 1.5 } }, slewLimits: null },
    boom: { pivot: { x: -0.8, y: 0, z: 2.3 }, stages: [{ name: 'Retracted', length: 6, cgFraction: 0.45 }], elevation: { min: 0, max: 70 }, mass: 3500 },
    outriggers: { legs: [leg('FL', 7, 1), leg('FR', 7, -1), leg('RL', 1.2, 1), leg('RR', 1.2, -1)] },
    winches: [],
    loadChart: { radii: [3], boomLengths: [6], rated: [[null]], conditions: { supports: 'outriggers-full', sector: null, note: '' } },
  };
}
