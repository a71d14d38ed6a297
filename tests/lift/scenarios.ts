import type { LiftInputIn } from '@/lib/lift';

/**
 * Invented test scenes. The square of pads at (±2, ±2) m with a 20 000 kg carrier centred is the
 * hand-checkable case of reference.md: a load at 6 m over a side tips at 20 000·2/(6 − 2) = 10 000 kg.
 */
export function squareOfPads(overrides: Partial<LiftInputIn> = {}): LiftInputIn {
  return {
    supports: [
      { id: 'FL', x: 2, y: 2, area: 0.25 },
      { id: 'RL', x: -2, y: 2, area: 0.25 },
      { id: 'RR', x: -2, y: -2, area: 0.25 },
      { id: 'FR', x: 2, y: -2, area: 0.25 },
    ],
    masses: [{ id: 'carrier', mass: 20000, x: 0, y: 0, z: 1 }],
    boom: { pivot: { x: 0, y: 0, z: 2 }, length: 6, elevation: 0, mass: 0, cgFraction: 0.5 },
    hook: { blockMass: 0, riggingMass: 0 },
    load: { mass: 5000, footprint: { kind: 'rect', length: 1, width: 1 }, height: 1, hang: 1 },
    swing: { from: 0, to: 360, direction: 'ccw' },
    soil: { allowable: 500 },
    ...overrides,
  };
}

/** An invented 50-ton-class rotator on four outriggers, boom raised, turning over the right side. */
export function rotator(overrides: Partial<LiftInputIn> = {}): LiftInputIn {
  return {
    supports: [
      { id: 'FL', x: 2.2, y: 2.4, area: 0.36, cribbingArea: 1.44, cribbingMass: 120 },
      { id: 'RL', x: -3.4, y: 2.4, area: 0.36, cribbingArea: 1.44, cribbingMass: 120 },
      { id: 'RR', x: -3.4, y: -2.4, area: 0.36, cribbingArea: 1.44, cribbingMass: 120 },
      { id: 'FR', x: 2.2, y: -2.4, area: 0.36, cribbingArea: 1.44, cribbingMass: 120 },
    ],
    masses: [
      { id: 'carrier', mass: 21000, x: 0.6, y: 0, z: 1.2 },
      { id: 'turret', mass: 4000, x: 0, y: 0, z: 2.2, rotates: true },
      { id: 'counterweight', mass: 3000, x: -1.6, y: 0, z: 2.0, rotates: true },
    ],
    boom: { pivot: { x: -0.6, y: 0, z: 3.0 }, length: 9, elevation: 35, mass: 3500, cgFraction: 0.45 },
    hook: { blockMass: 150, riggingMass: 80 },
    load: { mass: 6000, footprint: { kind: 'rect', length: 2.0, width: 1.6 }, height: 1.5, hang: 3.5 },
    swing: { from: 300, to: 60, direction: 'ccw' },
    bodies: [
      { id: 'cab', polygon: [{ x: 3.0, y: -1.25 }, { x: 5.2, y: -1.25 }, { x: 5.2, y: 1.25 }, { x: 3.0, y: 1.25 }], top: 3.1 },
      { id: 'tailboard', polygon: [{ x: -4.4, y: -1.25 }, { x: -3.8, y: -1.25 }, { x: -3.8, y: 1.25 }, { x: -4.4, y: 1.25 }], top: 1.4 },
    ],
    soil: { allowable: 143.64 },
    ...overrides,
  };
}

/**
 * Four corner pads (0.3 m²) from eight distances, for property generators: front-left (d0, d1),
 * rear-left (−d2, d3), rear-right (−d4, −d5), front-right (d6, −d7).
 */
export function cornerPads(d: readonly number[]): LiftInputIn['supports'] {
  return [
    { id: 'FL', x: d[0]!, y: d[1]!, area: 0.3 },
    { id: 'RL', x: -d[2]!, y: d[3]!, area: 0.3 },
    { id: 'RR', x: -d[4]!, y: -d[5]!, area: 0.3 },
    { id: 'FR', x: d[6]!, y: -d[7]!, area: 0.3 },
  ];
}
