import { exampleTruckModel } from './example-truck';
import type { TruckLegModel, TruckModel, TruckPartModel } from './truck-model';

/** A stored profile as the editor page receives it. */
export interface TruckProfileInput {
  id: number;
  version: number;
  name: string;
  unitNumber: string | null;
  spec: unknown;
}

type R = Record<string, unknown>;
const isObj = (v: unknown): v is R => !!v && typeof v === 'object' && !Array.isArray(v);
const num = (v: unknown, d: number) => (typeof v === 'number' && Number.isFinite(v) ? v : d);
const pt = (v: unknown) => (isObj(v) ? { x: num(v.x, 0), y: num(v.y, 0) } : null);

function readParts(spec: R): TruckPartModel[] {
  const carrier = isObj(spec.carrier) ? spec.carrier : spec;
  const list = Array.isArray(carrier.parts) ? carrier.parts : Array.isArray(carrier.outline) ? carrier.outline : [];
  return list.flatMap((p, i): TruckPartModel[] => {
    if (!isObj(p) || !Array.isArray(p.polygon)) return [];
    const polygon = p.polygon.map(pt).filter((q): q is { x: number; y: number } => q !== null);
    if (polygon.length < 3) return [];
    const kind = typeof p.kind === 'string' ? p.kind : typeof p.id === 'string' ? p.id : `part-${i}`;
    return [{ id: typeof p.id === 'string' ? p.id : kind, kind, polygon, top: num(p.top, 1.5) }];
  });
}

function readLegs(spec: R): TruckLegModel[] {
  const list = Array.isArray(spec.outriggers) ? spec.outriggers : Array.isArray(spec.legs) ? spec.legs : [];
  return list.flatMap((l): TruckLegModel[] => {
    if (!isObj(l) || typeof l.id !== 'string') return [];
    const mount = pt(l.mount);
    const st = isObj(l.stages) ? l.stages : {};
    const pad = isObj(l.pad) ? l.pad : {};
    if (!mount) return [];
    const side = num(pad.length, num(pad.side, 0.6));
    return [
      {
        id: l.id,
        mount,
        direction: num(l.direction, 90),
        retracted: num(st.retracted, 0),
        intermediate: typeof st.intermediate === 'number' ? st.intermediate : null,
        full: num(st.full, 2.5),
        pad: { length: side, width: num(pad.width, side) },
        padRatingKg: typeof l.padRating === 'number' ? l.padRating : null,
      },
    ];
  });
}

/** Profile spec → editor truck model; falls back to the example outline when the spec has no geometry. */
export function truckModelFromProfile(profile: TruckProfileInput): TruckModel {
  const spec = isObj(profile.spec) ? profile.spec : {};
  const parts = readParts(spec);
  const legs = readLegs(spec);
  if (parts.length === 0 || legs.length < 3) {
    return { ...exampleTruckModel(profile.id, profile.version, profile.name, profile.unitNumber), spec: profile.spec };
  }
  const boom = isObj(spec.boom) ? spec.boom : {};
  const pivot = isObj(boom.pivot) ? boom.pivot : {};
  const stages = Array.isArray(boom.stageLengths) ? (boom.stageLengths as unknown[]).filter((n): n is number => typeof n === 'number') : [];
  const elev = isObj(boom.elevation) ? boom.elevation : {};
  return {
    profileId: profile.id,
    profileVersion: profile.version,
    name: profile.name,
    unitNumber: profile.unitNumber,
    parts,
    legs,
    boom: {
      pivot: { x: num(pivot.x, 0), y: num(pivot.y, 0), z: num(pivot.z, 3) },
      minLength: stages.length ? Math.min(...stages) : num(boom.retractedLength, 7),
      maxLength: stages.length ? Math.max(...stages) : num(boom.extendedLength, 15),
      minElevation: num(elev.min, -5),
      maxElevation: num(elev.max, 75),
    },
    exampleOutline: false,
    spec: profile.spec,
  };
}
