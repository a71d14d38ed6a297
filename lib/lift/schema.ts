import { z } from 'zod';
import { RANGE } from './range';
import { riggingSchema } from './rigging-schema';

/**
 * The analysis input, validated at every boundary (route, CLI, library). Field names are the contract of
 * issue 3 and are not renamed. Masses accept any number here so that the engine can answer a negative or
 * missing mass with its own typed error; shapes and types are checked here.
 * Units: metres, kilograms, degrees, kPa. Truck frame unless stated (see docs/engine.md).
 */
export { RANGE } from './range';

const within = (min: number, max: number, unit: string) =>
  z.number().min(min, `must be from ${min} to ${max} ${unit}`).max(max, `must be from ${min} to ${max} ${unit}`);
const massKg = within(0, RANGE.mass, 'kg');
const truckCoord = within(-RANGE.truck, RANGE.truck, 'm');
const siteCoord = within(-RANGE.site, RANGE.site, 'm');
const heightM = within(-RANGE.truck, RANGE.height, 'm');
const area = within(RANGE.areaMin, RANGE.areaMax, 'm²');
const angleDeg = within(-RANGE.angle, RANGE.angle, '°');
const point2 = z.object({ x: siteCoord, y: siteCoord });
const point3 = z.object({ x: siteCoord, y: siteCoord, z: heightM });
const truckPoint3 = z.object({ x: truckCoord, y: truckCoord, z: heightM });
const id = z.string().min(1).max(64);
/** What a person calls the object (a label typed in the editor, "left rear"); results show it instead of the id. */
const name = z.string().max(120).optional();

export const supportSchema = z.object({
  id,
  name,
  x: truckCoord,
  y: truckCoord,
  /** Pad (or tyre contact) area on the ground, m². */
  area,
  /** Area of the cribbing or mat under the pad, m²; spreads the reaction. */
  cribbingArea: area.optional(),
  /** Own mass of the cribbing or mat, kg; added to the ground load under it. */
  cribbingMass: massKg.optional(),
});

export const massSchema = z.object({
  id,
  mass: massKg,
  x: truckCoord,
  y: truckCoord,
  z: heightM,
  /** True for parts that turn with the slew (turret, counterweight); given at slew 0. */
  rotates: z.boolean().default(false),
});

/**
 * Boom width used when the input gives none, m: wide for a heavy rotator's boom box, so that a gap is not
 * overstated (common practice, no published source).
 */
export const BOOM_WIDTH = 0.9;

export const boomSchema = z.object({
  pivot: truckPoint3,
  /** Pivot to tip, m (0 is refused as zero-length-boom). */
  length: within(0, RANGE.length, 'm'),
  /** Degrees above horizontal. */
  elevation: z.number().min(-90).max(90),
  mass: massKg,
  /** Width of the boom, m: the diameter of the capsule checked against obstacles and truck parts (BOOM_WIDTH when not given). */
  width: within(0.05, 10, 'm').optional(),
  /** Where the boom's own CG lies, as a fraction of the way from pivot to tip. */
  cgFraction: z.number().min(0).max(1),
});

export const footprintSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('rect'), length: within(0.001, RANGE.length, 'm'), width: within(0.001, RANGE.length, 'm') }),
  z.object({ kind: z.literal('circle'), diameter: within(0.001, RANGE.length, 'm') }),
  /** Points relative to the hook, x along the boom at the current slew. */
  z.object({ kind: z.literal('polygon'), points: z.array(z.object({ x: within(-RANGE.length, RANGE.length, 'm'), y: within(-RANGE.length, RANGE.length, 'm') })).min(3).max(256) }),
]);

export const loadSchema = z.object({
  mass: massKg,
  footprint: footprintSchema,
  height: within(0, RANGE.length, 'm'),
  /** Drop from the boom tip to the bottom of the load, m. */
  hang: within(0, RANGE.height, 'm'),
});

/**
 * Pick (`from`) and set (`to`) slews, degrees, and the direction of travel. The one rule for turning these
 * into an arc is lib/lift/swing.ts: a whole number of turns (0→360, 360→0, 0→720, 10→370 cw, within 1e-9°)
 * or more than a turn is a full turn; only from ≈ to is a single slew.
 */
export const swingSchema = z.object({
  from: angleDeg,
  to: angleDeg,
  direction: z.enum(['ccw', 'cw']),
});

export const prismSchema = z.object({
  id,
  name,
  polygon: z.array(point2).min(3).max(256),
  /** Height of its top above the ground, m. */
  top: within(0, RANGE.height, 'm'),
});

export const powerLineSchema = z.object({
  id,
  name,
  a: point3,
  b: point3,
  /** Nominal phase-to-phase voltage; null when unknown. */
  kV: z.number().positive().max(2000).nullable(),
  /** For an unknown voltage: the utility has confirmed it is at most 350 kV (20 ft rule). */
  atMost350kV: z.boolean().optional(),
  /** Clearance set by the utility or a registered engineer, m (needed above 1 000 kV; overrides Table A). */
  required: within(0.01, RANGE.height, 'm').optional(),
});

export const loadChartSchema = z.object({
  /** Load radii from the slew axis, m, ascending. */
  radii: z.array(within(0.001, 1000, 'm')).min(1).max(64),
  /** Boom lengths, m, ascending. */
  boomLengths: z.array(within(0.001, 1000, 'm')).min(1).max(32),
  /** rated[b][r]: rated capacity at boomLengths[b] and radii[r], kg; null where the chart gives none. */
  rated: z.array(z.array(within(0.001, RANGE.mass, 'kg').nullable())),
});

export const siteSchema = z.object({
  /** The truck's slew axis in the site frame, m, and the heading of its +x axis, degrees CCW. */
  x: siteCoord,
  y: siteCoord,
  heading: angleDeg,
  obstacles: z.array(prismSchema).max(500).default([]),
  powerLines: z.array(powerLineSchema).max(50).default([]),
});

export const liftInputSchema = z.object({
  supports: z.array(supportSchema).max(16),
  masses: z.array(massSchema).max(64),
  boom: boomSchema,
  hook: z.object({ blockMass: massKg.default(0), riggingMass: massKg.default(0) }).prefault({}),
  load: loadSchema,
  swing: swingSchema,
  bodies: z.array(prismSchema).max(64).default([]),
  obstacles: z.array(prismSchema).max(500).default([]),
  powerLines: z.array(powerLineSchema).max(50).default([]),
  soil: z.object({ allowable: within(RANGE.pressureMin, RANGE.pressureMax, 'kPa') }),
  limits: z
    .object({
      percentOfTipping: z.number().positive().max(100).default(85),
      clearance: within(0, 100, 'm').default(0.3),
      /** Percent of the load chart's rated capacity allowed. */
      percentOfRated: z.number().positive().max(100).default(100),
    })
    .prefault({}),
  rigging: riggingSchema.optional(),
  loadChart: loadChartSchema.optional(),
  /** Uncertainty of the load's weight, percent; the worst case is also reported at the upper weight. */
  weightUncertainty: z.number().min(0).max(100).optional(),
  /** How the load's weight is known; 'estimated' (from its dimensions) widens the default sensitivity band (weight-band.ts). */
  weightBasis: z.enum(['given', 'estimated']).optional(),
  /** Band of load weights the weight sensitivity covers, percent below and above the load's mass (defaults: weight-band.ts). */
  weightBand: z.object({ below: z.number().min(0).max(100), above: z.number().min(0).max(1000) }).optional(),
  site: siteSchema.optional(),
});

/** What callers pass (defaults may be omitted). */
export type LiftInputIn = z.input<typeof liftInputSchema>;
/** What the engine works on (defaults filled in). */
export type LiftInput = z.output<typeof liftInputSchema>;
export type Support = LiftInput['supports'][number];
export type MassItem = LiftInput['masses'][number];
export type Footprint = LiftInput['load']['footprint'];
export type Prism = LiftInput['obstacles'][number];
export type PowerLine = LiftInput['powerLines'][number];
export type LoadChart = z.output<typeof loadChartSchema>;
