import { z } from 'zod';
import { sceneObjectSchema } from './objects';
import { angle, point } from './primitives';
import { psfToKpa } from '@/lib/units';

/** The document version this code writes. Older versions are brought up by ./migrations. */
export const CURRENT_VERSION = 3;

export const swingSchema = z.object({
  /** Pick and set slew angles, truck frame (0 = over the cab, CCW seen from above). */
  from: angle,
  to: angle,
  direction: z.enum(['ccw', 'cw']),
});

/** Named ground choices; the presumptive values are IBC Table 1806.2 (see lib/lift for the source). */
export const soilSchema = z.object({
  preset: z.string().max(60).default('custom'),
  /** Allowable bearing pressure, kPa. */
  allowable: z.number().positive().max(10_000),
});

export const limitsSchema = z.object({
  percentOfTipping: z.number().positive().max(100).default(85),
  /** Minimum clearance to body parts and obstacles, m. */
  clearance: z.number().nonnegative().max(10).default(0.3),
  percentOfRated: z.number().positive().max(100).default(100),
});

/** A site photo or aerial image under the sketch (uploaded and calibrated by canvas/persistence). */
export const backgroundSchema = z.object({
  uploadId: z.string().min(1).max(200),
  /** Site position of the image's top-left corner, m. */
  x: z.number().finite(),
  y: z.number().finite(),
  /** Metres per image pixel after calibration. */
  metresPerPixel: z.number().positive().max(100),
  rotation: angle.default(0),
  opacity: z.number().min(0).max(1).default(0.6),
  locked: z.boolean().default(false),
  calibration: z
    .object({ a: z.object({ x: z.number(), y: z.number() }), b: z.object({ x: z.number(), y: z.number() }), distance: z.number().positive() })
    .nullable()
    .default(null),
});

export const sceneDocumentSchema = z.object({
  version: z.literal(CURRENT_VERSION),
  objects: z.array(sceneObjectSchema).max(2000),
  swing: swingSchema.default({ from: 0, to: 90, direction: 'ccw' }),
  // 3,000 psf (143.6 kPa): a round figure in either unit system (reads 144 kPa).
  soil: soilSchema.default({ preset: 'custom', allowable: psfToKpa(3000) }),
  limits: limitsSchema.prefault({}),
  background: backgroundSchema.nullable().default(null),
  /** The units the author was using; each viewer still sees their own setting. */
  unitsHint: z.enum(['imperial', 'metric']).default('imperial'),
  /** Grid spacing, m. */
  grid: z.number().positive().max(100).default(1.524),
  /**
   * Where the truck may stand (site frame, m), as the crew marked it: the placement advisor keeps the
   * truck's outline and pads inside it. null: not marked (anywhere clear of obstacles).
   */
  usableArea: z.array(point).min(3).max(64).nullable().default(null),
}).superRefine((doc, ctx) => {
  const ids = new Set<string>();
  doc.objects.forEach((o, i) => {
    if (ids.has(o.id)) ctx.addIssue({ code: 'custom', message: `Duplicate object id "${o.id}"`, path: ['objects', i, 'id'] });
    ids.add(o.id);
  });
  const trucks = doc.objects.filter((o) => o.kind === 'truck').length;
  const loads = doc.objects.filter((o) => o.kind === 'load').length;
  if (trucks > 1) ctx.addIssue({ code: 'custom', message: 'A scene has at most one truck', path: ['objects'] });
  if (loads > 1) ctx.addIssue({ code: 'custom', message: 'A scene has at most one load', path: ['objects'] });
});

export type SceneDocument = z.infer<typeof sceneDocumentSchema>;
export type SceneDocumentIn = z.input<typeof sceneDocumentSchema>;
export type Swing = SceneDocument['swing'];
export type Limits = SceneDocument['limits'];
export type Soil = SceneDocument['soil'];
