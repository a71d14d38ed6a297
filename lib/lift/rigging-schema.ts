import { z } from 'zod';
import { roundSlingColours } from './ratings/round-sling';
import { slingMaterials } from './ratings/hitch';
import { RANGE } from './range';

/**
 * The rigging part of the analysis input. Units: kilograms and degrees. Ratings come from the tables in
 * ./ratings (each row sourced) or from the item's tag (entered ratings).
 */
/** A rating or a pull, kg: positive and within the engine's mass range (issue 9 item 5). */
const pos = z.number().positive().max(RANGE.mass, `must be at most ${RANGE.mass} kg`);
const id = z.string().min(1).max(64);
/** What a person calls the item (its tag); results show it instead of the id. */
const name = z.string().max(120).optional();
/** Leg angle from horizontal, degrees; 90 = straight up. */
const legAngle = z.number().gt(0).max(90).default(90);
/** Legs in the assembly; at most three are counted as carrying the load (ASME B30.9, OSHA 1910.184). */
const legs = z.number().int().min(1).max(8).default(1);

export const slingSchema = z.object({
  id,
  name,
  /** What the sling is made of; picks the hitch factors, the chain table and the D/d table. */
  material: z.enum(slingMaterials).default('other'),
  /** Vertical rated capacity from the tag, kg. Give this, a round-sling colour or a chain grade and size. */
  verticalRating: pos.optional(),
  /** The tag's own choker and basket ratings, kg; they govern over the hitch factors. */
  chokerRating: pos.optional(),
  basketRating: pos.optional(),
  colour: z.enum(roundSlingColours).optional(),
  /** Chain: grade ("80", "100") and lifting size name ("3/8") as on the tag. */
  grade: z.string().max(8).optional(),
  size: z.string().max(20).optional(),
  hitch: z.enum(['vertical', 'choker', 'basket']),
  /** Choke angle in degrees (choker hitch only); a free-hanging choke (about 135°) is assumed when omitted. */
  chokeAngle: z.number().min(0).max(180).optional(),
  /** Basket hitch: D/d, the diameter the sling bends around ÷ the sling body's diameter. */
  bendRatio: z.number().positive().max(1000).optional(),
  angleFromHorizontal: legAngle,
  legs,
});

export const shackleSchema = z.object({
  id,
  name,
  /** Nominal size code, e.g. "5/8" or "1-1/4" (inches). Give this or wll. */
  size: z.string().max(20).optional(),
  /** Working load limit, kg. */
  wll: pos.optional(),
  /** Legs of the sling assembly, one shackle in each; demand follows the same three-leg rule. */
  legs,
  angleFromHorizontal: legAngle,
});

export const hookSchema = z.object({
  id,
  name,
  /** Working load limit marked on the hook, kg. */
  wll: pos,
  /** 1 for the master hook that carries the whole load; a leg hook takes its leg's tension. */
  legs,
  angleFromHorizontal: legAngle,
});

export const snatchBlockSchema = z.object({
  id,
  name,
  /** Working load limit of the block, kg. */
  wll: pos,
  /** Angle between the two parts of line at the block, degrees: 0 = parallel (load 2T), 180 = straight. */
  lineAngle: z.number().min(0).max(180).default(0),
  /** Pull in the line through the block, kg; omitted: the winch's line pull, else the hook load. */
  linePull: pos.optional(),
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
  hooks: z.array(hookSchema).max(16).default([]),
  snatchBlocks: z.array(snatchBlockSchema).max(16).default([]),
  winch: winchSchema.optional(),
});

export type Rigging = z.output<typeof riggingSchema>;
export type SlingInput = z.output<typeof slingSchema>;
export type SlingInputIn = z.input<typeof slingSchema>;
export type ShackleInput = z.output<typeof shackleSchema>;
export type HookInput = z.output<typeof hookSchema>;
export type SnatchBlockInput = z.output<typeof snatchBlockSchema>;
export type WinchInput = z.output<typeof winchSchema>;
