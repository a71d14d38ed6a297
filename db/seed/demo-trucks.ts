import type { TruckSpec } from '@/lib/equipment/truck-spec';

/**
 * Invented demo trucks. Every figure is an example made up for the demo, not any real truck's, and the
 * load charts are invented too: a real truck's values come from its manufacturer's documents.
 * Carrier frame: x forward from the rear edge of the tailboard, y left of the centreline (see truck-spec.ts).
 */
const legs = (o: { frontX: number; rearX: number; halfSpan: number; rearDir: number; reach: [number, number | null, number]; pad: number; rating: number; jackX?: number }) => [
  { id: 'FL', mount: { x: o.frontX, y: o.halfSpan }, direction: 90, stages: { retracted: o.reach[0], intermediate: o.reach[1], full: o.reach[2] }, pad: { length: o.pad, width: o.pad }, padRating: o.rating },
  { id: 'FR', mount: { x: o.frontX, y: -o.halfSpan }, direction: -90, stages: { retracted: o.reach[0], intermediate: o.reach[1], full: o.reach[2] }, pad: { length: o.pad, width: o.pad }, padRating: o.rating },
  { id: 'RL', mount: { x: o.rearX, y: o.halfSpan }, direction: o.rearDir, stages: { retracted: o.reach[0], intermediate: o.reach[1], full: o.reach[2] }, pad: { length: o.pad, width: o.pad }, padRating: o.rating },
  { id: 'RR', mount: { x: o.rearX, y: -o.halfSpan }, direction: -o.rearDir, stages: { retracted: o.reach[0], intermediate: o.reach[1], full: o.reach[2] }, pad: { length: o.pad, width: o.pad }, padRating: o.rating },
  ...(o.jackX === undefined
    ? []
    : [{ id: 'FJ', mount: { x: o.jackX, y: 0 }, direction: 0, stages: { retracted: 0.35, intermediate: null, full: 0.9 }, pad: { length: 0.5, width: 0.5 }, padRating: o.rating / 2 }]),
];

const winches = (pullKg: number, ropeM: number) => [
  { name: 'Main winch', ratedLinePull: pullKg, ropeDiameter: ropeM, ropeLength: 61, maxParts: 4 },
  { name: 'Auxiliary winch', ratedLinePull: pullKg, ropeDiameter: ropeM, ropeLength: 61, maxParts: 4 },
];

export const HR7_SPEC: TruckSpec = {
  specVersion: 1,
  notes: 'Example values for the demo; not a real truck. A real truck’s values come from its manufacturer’s documents.',
  carrier: {
    length: 12.2,
    width: 2.59,
    tailboard: { rear: 0, front: 0.9, width: 2.59, top: 1.3 },
    body: { rear: 0.9, front: 8.6, width: 2.59, top: 1.6 },
    cab: { rear: 8.8, front: 12.2, width: 2.5, top: 3.3 },
    mass: 19500,
    cg: { x: 6.8, y: 0, z: 1.1 },
    stowedHeight: 3.9,
    boomStowed: { slew: 0, elevation: 0 },
  },
  upper: {
    slewAxis: { x: 3.4, y: 0 },
    turret: { mass: 3200, cg: { x: -0.3, y: 0, z: 1.9 } },
    counterweight: { mass: 2300, cg: { x: -1.4, y: 0, z: 1.6 } },
    slewLimits: null,
  },
  boom: {
    pivot: { x: -0.9, y: 0, z: 2.4 },
    stages: [
      { name: 'Retracted', length: 6.4, cgFraction: 0.45 },
      { name: 'First stage out', length: 10.4, cgFraction: 0.47 },
      { name: 'Second stage out', length: 14.6, cgFraction: 0.5 },
    ],
    elevation: { min: -5, max: 75 },
    mass: 4800,
  },
  outriggers: { legs: legs({ frontX: 8.7, rearX: 1.4, halfSpan: 0.6, rearDir: 90, reach: [0.7, 1.8, 2.9], pad: 0.61, rating: 18000, jackX: 12.0 }) },
  winches: winches(22700, 0.0222),
  loadChart: {
    radii: [2.5, 3, 4, 5, 6, 8, 10, 12],
    boomLengths: [6.4, 10.4, 14.6],
    rated: [
      [45000, 36000, 27000],
      [40000, 32000, 24000],
      [30000, 25000, 19500],
      [22000, 20000, 16000],
      [null, 16500, 13500],
      [null, 11500, 10000],
      [null, null, 7600],
      [null, null, 5900],
    ],
    conditions: { supports: 'outriggers-full', sector: null, note: 'Invented example chart: on outriggers fully extended, 360°.' },
  },
};

export const HR4_SPEC: TruckSpec = {
  specVersion: 1,
  notes: 'Example values for the demo; not a real truck. Rear legs swing out at an angle.',
  carrier: {
    length: 10.4,
    width: 2.55,
    tailboard: { rear: 0, front: 0.8, width: 2.55, top: 1.25 },
    body: { rear: 0.8, front: 7.1, width: 2.55, top: 1.5 },
    cab: { rear: 7.3, front: 10.4, width: 2.45, top: 3.2 },
    mass: 15800,
    cg: { x: 5.9, y: 0, z: 1.05 },
    stowedHeight: 3.7,
    boomStowed: { slew: 0, elevation: 0 },
  },
  upper: {
    slewAxis: { x: 2.9, y: 0 },
    turret: { mass: 2600, cg: { x: -0.25, y: 0, z: 1.8 } },
    counterweight: { mass: 1500, cg: { x: -1.2, y: 0, z: 1.5 } },
    slewLimits: null,
  },
  boom: {
    pivot: { x: -0.8, y: 0, z: 2.3 },
    stages: [
      { name: 'Retracted', length: 5.8, cgFraction: 0.45 },
      { name: 'First stage out', length: 8.8, cgFraction: 0.47 },
      { name: 'Second stage out', length: 12.0, cgFraction: 0.5 },
    ],
    elevation: { min: -5, max: 72 },
    mass: 3600,
  },
  outriggers: { legs: legs({ frontX: 7.2, rearX: 1.2, halfSpan: 0.5, rearDir: 135, reach: [0.6, 1.5, 2.6], pad: 0.56, rating: 14000 }) },
  winches: winches(18100, 0.019),
  loadChart: {
    radii: [2.5, 3, 4, 5, 6, 8, 10],
    boomLengths: [5.8, 8.8, 12.0],
    rated: [
      [31500, 25000, 18500],
      [28000, 22500, 16500],
      [21000, 17500, 13500],
      [null, 14000, 11000],
      [null, 11500, 9200],
      [null, null, 6600],
      [null, null, 4900],
    ],
    conditions: { supports: 'outriggers-full', sector: null, note: 'Invented example chart: on outriggers fully extended, 360°.' },
  },
};

export const CF2_SPEC: TruckSpec = {
  specVersion: 1,
  notes: 'Example values for the demo; not a real truck.',
  carrier: {
    length: 11.3,
    width: 2.59,
    tailboard: { rear: 0, front: 0.85, width: 2.59, top: 1.3 },
    body: { rear: 0.85, front: 7.9, width: 2.59, top: 1.55 },
    cab: { rear: 8.1, front: 11.3, width: 2.5, top: 3.25 },
    mass: 17600,
    cg: { x: 6.3, y: 0, z: 1.1 },
    stowedHeight: 3.8,
    boomStowed: { slew: 0, elevation: 0 },
  },
  upper: {
    slewAxis: { x: 3.1, y: 0 },
    turret: { mass: 2900, cg: { x: -0.3, y: 0, z: 1.85 } },
    counterweight: { mass: 1900, cg: { x: -1.3, y: 0, z: 1.55 } },
    slewLimits: null,
  },
  boom: {
    pivot: { x: -0.85, y: 0, z: 2.35 },
    stages: [
      { name: 'Retracted', length: 6.1, cgFraction: 0.45 },
      { name: 'First stage out', length: 9.6, cgFraction: 0.47 },
      { name: 'Second stage out', length: 13.2, cgFraction: 0.5 },
    ],
    elevation: { min: -5, max: 74 },
    mass: 4200,
  },
  outriggers: { legs: legs({ frontX: 8.0, rearX: 1.3, halfSpan: 0.6, rearDir: 90, reach: [0.7, 1.7, 2.7], pad: 0.61, rating: 16000, jackX: 11.1 }) },
  winches: winches(20400, 0.0206),
  loadChart: {
    radii: [2.5, 3, 4, 5, 6, 8, 10, 12],
    boomLengths: [6.1, 9.6, 13.2],
    rated: [
      [36000, 29000, 22000],
      [32500, 26000, 19500],
      [24500, 20500, 16000],
      [18000, 16500, 13000],
      [null, 13500, 11000],
      [null, 9500, 8200],
      [null, null, 6200],
      [null, null, 4700],
    ],
    conditions: { supports: 'outriggers-full', sector: null, note: 'Invented example chart: on outriggers fully extended, 360°.' },
  },
};

export const DEMO_TRUCKS: { org: 'harrow-ridge' | 'cobalt-flats'; name: string; unitNumber: string; spec: TruckSpec }[] = [
  { org: 'harrow-ridge', name: '50-ton rotator (example values)', unitNumber: 'HR-7', spec: HR7_SPEC },
  { org: 'harrow-ridge', name: '35-ton rotator (example values)', unitNumber: 'HR-4', spec: HR4_SPEC },
  { org: 'cobalt-flats', name: '40-ton rotator (example values)', unitNumber: 'CF-2', spec: CF2_SPEC },
];
