import { z } from 'zod';
import { angle, coord, height, length, massKg, objectBase, objectId, point } from './primitives';

/** Cribbing or a mat under one pad: its plan area spreads the reaction, its mass adds to the ground load. */
export const cribbingSchema = z.object({
  area: z.number().finite().positive().max(20),
  mass: massKg.max(5000),
  label: z.string().max(60).default(''),
});

export const legSetupSchema = z.object({
  /** Metres out from the fully retracted position. */
  extension: z.number().finite().min(0).max(15),
  cribbing: cribbingSchema.nullable().default(null),
});

/** The truck, from a versioned profile. x, y is the slew axis; heading is the truck's +x (toward the cab). */
export const truckObjectSchema = z.object({
  ...objectBase,
  kind: z.literal('truck'),
  profileId: z.number().int().positive(),
  profileVersion: z.number().int().positive(),
  legs: z.record(z.string().min(1).max(8), legSetupSchema).default({}),
  boom: z.object({
    /** Current slew, truck frame: 0 = over the cab, 90 = left side, 180 = over the tailboard. */
    slew: angle.default(0),
    elevation: z.number().finite().min(-10).max(89),
    length: length(80),
  }),
});

export const riggingPickSchema = z.object({
  /** Inventory item id; the tag and ratings are copied so a saved plan reads the same later. */
  itemId: z.number().int().positive().nullable(),
  tag: z.string().max(60),
  kind: z.string().max(40),
  /** The inventory's size text (a chain's size and grade, e.g. "3/8 in grade 80"). */
  size: z.string().max(60).default(''),
  hitch: z.enum(['vertical', 'choker', 'basket']),
  /** Choker hitch: the choke angle, degrees; null = not measured (a free-hanging choke is assumed). */
  chokeAngle: z.number().min(0).max(180).nullable().default(null),
  /** Basket hitch: D/d, the diameter bent around ÷ the sling body's diameter; null = not given. */
  bendRatio: z.number().positive().max(1000).nullable().default(null),
  /** Snatch block: the angle between its two parts of line, degrees; null = parallel lines assumed. */
  lineAngle: z.number().min(0).max(180).nullable().default(null),
  legs: z.number().int().min(1).max(8).default(1),
  /** Leg angle from horizontal, degrees (90 = straight up). */
  angleFromHorizontal: z.number().gt(0).max(90).default(90),
  /** Rated capacity for the chosen hitch, kg. */
  ratingKg: z.number().positive().max(500_000),
  /** The item's ratings per hitch as the inventory gave them, so a hitch change picks the right one. */
  ratings: z
    .object({ vertical: z.number().positive().nullable(), choker: z.number().positive().nullable(), basket: z.number().positive().nullable() })
    .nullable()
    .default(null),
  massKg: massKg.max(2000).default(0),
});

const coilShape = z.object({
  kind: z.literal('coil'),
  eye: z.enum(['vertical', 'horizontal']),
  outerDiameter: length(5),
  innerDiameter: z.number().finite().positive().max(4),
  width: length(5),
});
const boxShape = z.object({ kind: z.literal('box'), length: length(30), width: length(10), height: length(10) });
const vehicleShape = z.object({ kind: z.literal('vehicle'), length: length(30), width: length(5), height: length(6) });
export const loadShapeSchema = z.discriminatedUnion('kind', [coilShape, boxShape, vehicleShape]);

/** The load at its resting (pick) position. */
export const loadObjectSchema = z.object({
  ...objectBase,
  kind: z.literal('load'),
  shape: loadShapeSchema,
  /** 'given' uses massKg; 'estimate' works it out from the dimensions and the density. */
  massMode: z.enum(['given', 'estimate']).default('given'),
  massKg: massKg,
  /** kg/m³; steel ≈ 7850 (value from memory of handbook steel density) for coils. */
  density: z.number().positive().max(20000).default(7850),
  weightUncertainty: z.number().min(0).max(100).default(0),
  /** CG offset from the footprint centre, m (local frame, z up from the load bottom). */
  cg: z.object({ x: z.number().finite(), y: z.number().finite(), z: z.number().finite().min(0) }).default({ x: 0, y: 0, z: 0 }),
  /** Drop from the boom tip to the load bottom, m. */
  hang: z.number().finite().min(0).max(60).default(3),
  blockMassKg: massKg.max(5000).default(0),
  rigging: z.array(riggingPickSchema).max(16).default([]),
});

export const trailerObjectSchema = z.object({
  ...objectBase,
  kind: z.literal('trailer'),
  length: length(30),
  width: length(4),
  deckHeight: height,
});

export const OBSTACLE_KINDS = ['structure', 'vehicle', 'pole', 'tree', 'traffic-lane', 'power-line'] as const;
const obstacleShape = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('rect'), length: length(), width: length() }),
  z.object({ kind: z.literal('circle'), diameter: length(100) }),
  /** Points relative to the object's position, unrotated. */
  z.object({ kind: z.literal('polygon'), points: z.array(point).min(3).max(128) }),
  /** A wire span centred on the position, along the rotation (power lines). */
  z.object({ kind: z.literal('line'), length: length(1000) }),
]);

export const obstacleObjectSchema = z
  .object({
    ...objectBase,
    kind: z.literal('obstacle'),
    obstacleKind: z.enum(OBSTACLE_KINDS),
    shape: obstacleShape,
    /** Top above the ground, m; for a power line, the height of the lowest wire. */
    height,
    /** Power lines only: nominal voltage, kV; null when unknown. */
    voltageKV: z.number().positive().max(1000).nullable().default(null),
  })
  .refine((o) => (o.obstacleKind === 'power-line') === (o.shape.kind === 'line'), {
    message: 'A power line is drawn as a line, and only a power line is',
    path: ['shape'],
  });

export const noteObjectSchema = z.object({
  ...objectBase,
  kind: z.literal('note'),
  text: z.string().max(2000),
});

export const tapeObjectSchema = z.object({
  ...objectBase,
  kind: z.literal('tape'),
  /** The far end; the near end is (x, y). */
  x2: coord,
  y2: coord,
});

export const sceneObjectSchema = z.discriminatedUnion("kind", [
  truckObjectSchema,
  loadObjectSchema,
  trailerObjectSchema,
  obstacleObjectSchema,
  noteObjectSchema,
  tapeObjectSchema,
]);

export type TruckObject = z.infer<typeof truckObjectSchema>;
export type LoadObject = z.infer<typeof loadObjectSchema>;
export type LoadShape = z.infer<typeof loadShapeSchema>;
export type TrailerObject = z.infer<typeof trailerObjectSchema>;
export type ObstacleObject = z.infer<typeof obstacleObjectSchema>;
export type ObstacleKind = (typeof OBSTACLE_KINDS)[number];
export type NoteObject = z.infer<typeof noteObjectSchema>;
export type TapeObject = z.infer<typeof tapeObjectSchema>;
export type RiggingPick = z.infer<typeof riggingPickSchema>;
export type SceneObject = z.infer<typeof sceneObjectSchema>;
export type SceneObjectKind = SceneObject['kind'];
export { objectId, coord, angle };
