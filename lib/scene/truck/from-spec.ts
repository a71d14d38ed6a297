import type { TruckSpec } from '@/lib/equipment/truck-spec';
import { truckSpecSchema } from '@/lib/equipment/truck-spec-rules';
import { bodyPolygons, toTruckFrame } from '@/lib/equipment/to-lift-input';
import { exampleTruckModel } from './example-truck';
import type { TruckModel } from './truck-model';

/** A stored profile as the editor page receives it. */
export interface TruckProfileInput {
  id: number;
  version: number;
  name: string;
  unitNumber: string | null;
  spec: unknown;
}

/** Spec (carrier frame) → the editor's truck model (truck frame, origin at the slew axis). */
export function truckModelFromSpec(profile: TruckProfileInput, spec: TruckSpec): TruckModel {
  const stages = spec.boom.stages.map((s) => s.length);
  return {
    profileId: profile.id,
    profileVersion: profile.version,
    name: profile.name,
    unitNumber: profile.unitNumber,
    parts: bodyPolygons(spec).map((p) => ({ id: p.id, kind: p.id, polygon: p.polygon, top: p.top })),
    legs: spec.outriggers.legs.map((l) => ({
      id: l.id,
      mount: toTruckFrame(spec, l.mount),
      direction: l.direction,
      retracted: l.stages.retracted,
      intermediate: l.stages.intermediate,
      full: l.stages.full,
      pad: { ...l.pad },
      padRatingKg: l.padRating,
    })),
    boom: {
      pivot: { ...spec.boom.pivot },
      minLength: Math.min(...stages),
      maxLength: Math.max(...stages),
      minElevation: spec.boom.elevation.min,
      maxElevation: spec.boom.elevation.max,
    },
    exampleOutline: false,
    spec,
  };
}

/** Profile → truck model; a profile whose spec does not validate gets the example outline, flagged. */
export function truckModelFromProfile(profile: TruckProfileInput): TruckModel {
  const parsed = truckSpecSchema.safeParse(profile.spec);
  if (parsed.success) return truckModelFromSpec(profile, parsed.data);
  return { ...exampleTruckModel(profile.id, profile.version, profile.name, profile.unitNumber), spec: null };
}
