import { z } from 'zod';

/**
 * The analysis input, validated at every boundary (route, CLI, library). Field names are the contract of
 * issue 3 and are not renamed. Masses accept any number here so that the engine can answer a negative or
 * missing mass with its own typed error; shapes and types are checked here.
 * Units: metres, kilograms, degrees, kPa. Truck frame unless stated (see docs/engine.md).
 */
const num = z.number();
const pos = z.number().positive();
const point2 = z.object({ x: num, y: num });
const point3 = z.object({ x: num, y: num, z: num });
const id = z.string().min(1).max(64);
/** What a person calls the object (a label typed in the editor, "left rear"); results show it instead of the id. */
const name = z.string().max(120).optional();

export const supportSchema = z.object({
  id,
  name,
  x: num,
  y: num,
  /** Pad (or tyre contact) area on the ground, m². */
  area: pos,
  /** Area of the cribbing or mat under the pad, m²; spreads the reaction. */
  cribbingArea: pos.optional(),
  /** Own mass of the cribbing or mat, kg; added to the ground load under it. */
  cribbingMass: num.optional(),
});

export const massSchema = z.object({
  id,
  mass: num,
  x: num,
  y: num,
  z: num,
  /** True for parts that turn with the slew (turret, counterweight); given at slew 0. */
  rotates: z.boolean().default(false),
});

export const boomSchema = z.object({
  pivot: point3,
  length: num,
  /** Degrees above horizontal. */
  elevation: z.number().min(-90).max(90),
  mass: num,
  /** Where the boom's own CG lies, as a fraction of the way from pivot to tip. */
  cgFraction: z.number().min(0).max(1),
});

export const footprintSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('rect'), length: pos, width: pos }),
  z.object({ kind: z.literal('circle'), diameter: pos }),
  /** Points relative to the hook, x along the boom at the current slew. */
  z.object({ kind: z.literal('polygon'), points: z.array(point2).min(3).max(256) }),
]);

export const loadSchema = z.object({
  mass: num,
  footprint: footprintSchema,
  height: z.number().nonnegative(),
  /** Drop from the boom tip to the bottom of the load, m. */
  hang: z.number().nonnegative(),
});

/**
 * Pick (`from`) and set (`to`) slews, degrees, and the direction of travel. The one rule for turning these
 * into an arc is lib/lift/swing.ts: a whole number of turns (0→360, 360→0, 0→720, 10→370 cw, within 1e-9°)
 * or more than a turn is a full turn; only from ≈ to is a single slew.
 */
export const swingSchema = z.object({
  from: num,
  to: num,
  direction: z.enum(['ccw', 'cw']),
});

export const prismSchema = z.object({
  id,
  name,
  polygon: z.array(point2).min(3).max(256),
  /** Height of its top above the ground, m. */
  top: num,
});

export const powerLineSchema = z.object({
  id,
  name,
  a: point3,
  b: point3,
  /** Nominal phase-to-phase voltage; null when unknown. */
  kV: z.number().positive().nullable(),
  /** For an unknown voltage: the utility has confirmed it is at most 350 kV (20 ft rule). */
  atMost350kV: z.boolean().optional(),
  /** Clearance set by the utility or a registered engineer, m (needed above 1 000 kV; overrides Table A). */
  required: pos.optional(),
});

const hitch = z.enum(['vertical', 'choker', 'basket']);
export const roundSlingColours = ['purple', 'green', 'yellow', 'tan', 'red', 'white', 'blue', 'grey', 'brown', 'olive', 'black'] as const;

export const slingSchema = z.object({
  id,
  name,
  /** Vertical rated capacity, kg. Give this or a round-sling colour. */
  verticalRating: pos.optional(),
  colour: z.enum(roundSlingColours).optional(),
  hitch,
  /** Choke angle in degrees (choker hitch only); 120° or more when omitted. */
  chokeAngle: z.number().min(0).max(180).optional(),
  /** Sling leg angle from horizontal, degrees; 90 = straight up. */
  angleFromHorizontal: z.number().gt(0).max(90).default(90),
  legs: z.number().int().min(1).max(8).default(1),
});

export const shackleSchema = z.object({
  id,
  name,
  /** Nominal size code, e.g. "5/8" or "1-1/4" (inches). Give this or wll. */
  size: z.string().optional(),
  /** Working load limit, kg. */
  wll: pos.optional(),
  /** Shackles sharing the load, one per leg. */
  legs: z.number().int().min(1).max(8).default(1),
  angleFromHorizontal: z.number().gt(0).max(90).default(90),
});

export const winchSchema = z.object({
  /** Rated line pull of the winch on its working layer, kg. */
  ratedLinePull: pos,
  parts: z.number().int().min(1).max(16),
  sheaves: z.enum(['bushed', 'roller']),
  leadSheaves: z.number().int().min(0).max(8).default(0),
});

export const riggingSchema = z.object({
  slings: z.array(slingSchema).max(32).default([]),
  shackles: z.array(shackleSchema).max(32).default([]),
  winch: winchSchema.optional(),
});

export const loadChartSchema = z.object({
  /** Load radii from the slew axis, m, ascending. */
  radii: z.array(pos).min(1).max(64),
  /** Boom lengths, m, ascending. */
  boomLengths: z.array(pos).min(1).max(32),
  /** rated[b][r]: rated capacity at boomLengths[b] and radii[r], kg; null where the chart gives none. */
  rated: z.array(z.array(z.number().positive().nullable())),
});

export const siteSchema = z.object({
  /** The truck's slew axis in the site frame, m, and the heading of its +x axis, degrees CCW. */
  x: num,
  y: num,
  heading: num,
  obstacles: z.array(prismSchema).max(500).default([]),
  powerLines: z.array(powerLineSchema).max(50).default([]),
});

export const liftInputSchema = z.object({
  supports: z.array(supportSchema).max(16),
  masses: z.array(massSchema).max(64),
  boom: boomSchema,
  hook: z.object({ blockMass: num.default(0), riggingMass: num.default(0) }).prefault({}),
  load: loadSchema,
  swing: swingSchema,
  bodies: z.array(prismSchema).max(64).default([]),
  obstacles: z.array(prismSchema).max(500).default([]),
  powerLines: z.array(powerLineSchema).max(50).default([]),
  soil: z.object({ allowable: pos }),
  limits: z
    .object({
      percentOfTipping: z.number().positive().max(100).default(85),
      clearance: z.number().nonnegative().default(0.3),
      /** Percent of the load chart's rated capacity allowed. */
      percentOfRated: z.number().positive().max(100).default(100),
    })
    .prefault({}),
  rigging: riggingSchema.optional(),
  loadChart: loadChartSchema.optional(),
  /** Uncertainty of the load's weight, percent; the worst case is also reported at the upper weight. */
  weightUncertainty: z.number().min(0).max(100).optional(),
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
export type Rigging = z.output<typeof riggingSchema>;
export type LoadChart = z.output<typeof loadChartSchema>;
export type SlingInput = z.output<typeof slingSchema>;
export type ShackleInput = z.output<typeof shackleSchema>;
export type WinchInput = z.output<typeof winchSchema>;
