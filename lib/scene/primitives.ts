import { z } from 'zod';

/**
 * Building blocks of the scene document. Site frame: metres, x east, y north; angles in degrees,
 * counter-clockwise from east. Bounds are generous sanity limits (a roadside scene fits in 2 km).
 */
export const SITE_LIMIT = 2000;
export const coord = z.number().finite().min(-SITE_LIMIT).max(SITE_LIMIT);
export const angle = z.number().finite().min(-3600).max(3600);
export const length = (max = 500) => z.number().finite().positive().max(max);
export const height = z.number().finite().min(0).max(200);
export const massKg = z.number().finite().nonnegative().max(500_000);
export const point = z.object({ x: coord, y: coord });
export type Point = z.infer<typeof point>;

export const objectId = z.string().min(1).max(64);

/** Fields every placed object carries. */
export const objectBase = {
  id: objectId,
  /** Position of the object's reference point, site frame (m). */
  x: coord,
  y: coord,
  /** Rotation in the site frame, degrees CCW from east. */
  rotation: angle.default(0),
  locked: z.boolean().default(false),
  label: z.string().max(120).default(''),
};
