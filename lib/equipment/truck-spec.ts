import { z } from 'zod';
import { RANGE } from '@/lib/lift/range';

/** The named parts of the body outline, rear to front. */
export const BODY_PART_IDS = ['tailboard', 'body', 'cab'] as const;

/**
 * A truck profile's numbers, SI inside (m, kg, degrees).
 *
 * Carrier frame: origin on the ground at the rear edge of the tailboard, on the centreline; x forward
 * (toward the cab), y to the left, z up. Everything on the carrier is measured in this frame, so every
 * position along the truck is a positive distance from its back end.
 *
 * Upper frame: origin on the ground at the slew axis, axes as the carrier's with the upper at slew 0
 * (boom pointing forward). Turret, counterweight and boom pivot are given in this frame; they turn
 * with the slew. This is the lift engine's truck frame, which is why the conversion is a shift.
 */

/**
 * Every number has a physical range (issue 11): the lift engine's own ranges (lib/lift/schema RANGE), so a
 * profile that saves is one the engine accepts, and a figure like 1e300 is refused with the range named.
 */
const within = (label: string, min: number, max: number, unit: string) =>
  // zod 4 numbers already refuse NaN and ±Infinity.
  z
    .number({ error: `${label} must be a number` })
    .refine(
      (v) => v >= min && v <= max,
      min === -Infinity ? `${label} must be at most ${max.toLocaleString('en-US')} ${unit}` : `${label} must be from ${min} to ${max.toLocaleString('en-US')} ${unit}`,
    );
const num = (label: string) => within(label, -RANGE.truck, RANGE.truck, 'm');
export const length = (label: string) =>
  within(label, -Infinity, RANGE.length, 'm').refine((v) => v > 0, `${label} must be more than 0`);
export const distance = (label: string) =>
  within(label, -Infinity, RANGE.length, 'm').refine((v) => v >= 0, `${label} cannot be negative`);
export const mass = (label: string) =>
  within(label, -Infinity, RANGE.mass, 'kg').refine((v) => v >= 0, `${label} cannot be negative`);
const positiveMass = (label: string) =>
  within(label, -Infinity, RANGE.mass, 'kg').refine((v) => v > 0, `${label} must be more than 0 (negative or zero masses are refused)`);
const angle = (label: string, min: number, max: number) =>
  z.number({ error: `${label} must be a number` }).refine((v) => v >= min && v <= max, `${label} must be between ${min}° and ${max}°`);

const point3 = (label: string) => z.object({ x: num(`${label} x`), y: num(`${label} y`), z: distance(`${label} height`) });

/** A rectangular part of the body outline, centred on the carrier's centreline. */
export const bodyPartSchema = (label: string) =>
  z.object({
    rear: distance(`${label} rear edge`),
    front: length(`${label} front edge`),
    width: length(`${label} width`),
    top: length(`${label} top height`),
  });
export type BodyPart = z.infer<ReturnType<typeof bodyPartSchema>>;

export type BodyPartId = (typeof BODY_PART_IDS)[number];

export const carrierSchema = z.object({
  length: length('Overall length'),
  width: length('Overall width'),
  tailboard: bodyPartSchema('Tailboard'),
  body: bodyPartSchema('Body'),
  cab: bodyPartSchema('Cab'),
  mass: positiveMass('Carrier mass'),
  cg: point3('Carrier CG'),
  stowedHeight: length('Stowed height'),
  boomStowed: z.object({ slew: angle('Stowed boom slew', -360, 360), elevation: angle('Stowed boom elevation', -30, 90) }),
});

export const upperSchema = z.object({
  slewAxis: z.object({ x: num('Slew axis x'), y: num('Slew axis y') }),
  turret: z.object({ mass: mass('Turret mass'), cg: point3('Turret CG') }),
  counterweight: z.object({ mass: mass('Counterweight mass'), cg: point3('Counterweight CG') }),
  /** null: slews all the way round. Otherwise the allowed arc from `min` to `max`, counter-clockwise. */
  slewLimits: z.object({ min: angle('Slew limit (from)', -360, 360), max: angle('Slew limit (to)', -360, 360) }).nullable(),
  /** Slew speed at full lever, degrees per second; the replay plays 1× at this rate (optional). */
  slewSpeed: z.number({ error: 'Slew speed must be a number' }).refine((v) => v > 0 && v <= 30, 'Slew speed must be more than 0 and at most 30 °/s').optional(),
});

export const boomStageSchema = z.object({
  name: z.string().trim().min(1, 'Stage name is required').max(40, 'Stage name can be at most 40 characters'),
  /** Pivot-to-tip length with the boom extended to this stage. */
  length: length('Stage length'),
  /** Where the boom's own CG sits, as a fraction of the way from pivot to tip, at this length. */
  cgFraction: z.number({ error: 'Boom CG fraction must be a number' }).refine((v) => v > 0 && v < 1, 'Boom CG fraction must be between 0 and 1'),
});

export const boomSchema = z.object({
  pivot: point3('Boom pivot'),
  stages: z.array(boomStageSchema).min(1, 'The boom needs at least its retracted length').max(8, 'At most 8 boom stages'),
  elevation: z.object({ min: angle('Lowest elevation', -30, 90), max: angle('Highest elevation', -30, 90) }),
  mass: positiveMass('Boom mass'),
  /** Overall width of the boom, m: the lift engine checks a capsule this wide against obstacles (its default when omitted). */
  width: z.number({ error: 'Boom width must be a number' }).refine((v) => v >= 0.05 && v <= 10, 'Boom width must be from 0.05 m to 10 m').optional(),
});

export const legSchema = z.object({
  id: z
    .string()
    .trim()
    .regex(/^[A-Z][A-Z0-9]{0,3}$/, 'Leg id is 1–4 capital letters or digits, e.g. FL, RR, FJ'),
  mount: z.object({ x: num('Leg mount x'), y: num('Leg mount y') }),
  /** Direction the leg travels, degrees from +x counter-clockwise seen from above (90 = straight out left). */
  direction: angle('Leg direction', -360, 360),
  /** Mount-to-pad-centre distance at each stop. */
  stages: z.object({
    retracted: distance('Retracted reach'),
    intermediate: distance('Intermediate reach').nullable(),
    full: length('Full reach'),
  }),
  pad: z.object({ length: length('Pad length'), width: length('Pad width') }),
  padRating: positiveMass('Pad rating'),
});
export type Leg = z.infer<typeof legSchema>;

export const winchSchema = z.object({
  name: z.string().trim().min(1, 'Winch name is required').max(40),
  /** First-layer rated line pull, as the mass it holds (kg). */
  ratedLinePull: within('Rated line pull', -Infinity, RANGE.mass, 'kg').refine((v) => v > 0, 'Rated line pull must be more than 0'),
  ropeDiameter: length('Rope diameter'),
  ropeLength: length('Rope length'),
  maxParts: z.number({ error: 'Parts of line must be a number' }).int('Parts of line must be a whole number').min(1, 'Parts of line must be at least 1').max(12, 'Parts of line can be at most 12'),
});

export const loadChartConditionsSchema = z.object({
  supports: z.enum(['outriggers-full', 'outriggers-intermediate', 'outriggers-retracted', 'on-tyres'], {
    error: 'Chart supports must be outriggers (full, intermediate or retracted) or on tyres',
  }),
  /** null: all the way round (360°). Otherwise the sector, counter-clockwise from `from` to `to`. */
  sector: z.object({ from: angle('Sector from', -360, 360), to: angle('Sector to', -360, 360) }).nullable(),
  note: z.string().max(300, 'Chart note can be at most 300 characters').default(''),
});

export const loadChartSchema = z.object({
  /** Rows, metres from the slew axis to the hook, strictly increasing. */
  radii: z.array(length('Radius')).min(1, 'The load chart needs at least one radius').max(60, 'At most 60 radii'),
  /** Columns, pivot-to-tip boom lengths, strictly increasing. */
  boomLengths: z.array(length('Boom length')).min(1, 'The load chart needs at least one boom length').max(12, 'At most 12 boom lengths'),
  /** rated[row][column] in kg; null where the chart gives no rating. */
  rated: z.array(z.array(within('Rated load', -Infinity, RANGE.mass, 'kg').refine((v) => v > 0, 'Rated load must be more than 0; leave the cell empty where the chart gives no rating').nullable())),
  conditions: loadChartConditionsSchema,
});
export type LoadChart = z.infer<typeof loadChartSchema>;

export const truckSpecShape = z.object({
  specVersion: z.literal(1, { error: 'specVersion must be 1' }),
  notes: z.string().max(2000, 'Notes can be at most 2000 characters').default(''),
  carrier: carrierSchema,
  upper: upperSchema,
  boom: boomSchema,
  outriggers: z.object({ legs: z.array(legSchema).min(3, 'A truck needs at least 3 outrigger legs or jacks').max(8, 'At most 8 legs') }),
  winches: z.array(winchSchema).max(4, 'At most 4 winches'),
  loadChart: loadChartSchema,
});

export type TruckSpec = z.infer<typeof truckSpecShape>;
export type TruckSpecInput = z.input<typeof truckSpecShape>;
