import type { LiftInputIn } from '@/lib/lift/schema';
import { truckToLiftParts, TruckSetupError, type TruckSetup } from '@/lib/equipment/to-lift-input';
import { picksToRigging } from '@/lib/equipment/rigging-to-lift';
import type { SceneDocument } from './schema';
import type { LoadObject, ObstacleObject, TrailerObject, TruckObject } from './objects';
import type { TruckModel } from './truck/truck-model';
import { loadHeight, loadLocalOutline, loadMass } from './geometry/load';
import { obstacleFootprints, wireEnds } from './geometry/obstacle';
import { trailerFootprints } from './geometry/trailer';
import { rotate } from './geometry/vec';

/** Why there is nothing to analyse yet, in words for the results panel. */
export type SceneProblem = { kind: 'incomplete' | 'setup'; message: string; field?: string };

export type SceneLift = { ok: true; input: LiftInputIn; names: Record<string, string> } | { ok: false; problem: SceneProblem };

/** The truck's setup as lib/equipment reads it: every leg in the document is set down. */
export function truckSetup(truck: TruckObject): TruckSetup {
  return {
    legs: Object.fromEntries(
      Object.entries(truck.legs).map(([id, l]) => [id, { extension: l.extension, ...(l.cribbing ? { cribbing: { area: l.cribbing.area, mass: l.cribbing.mass } } : {}) }]),
    ),
    boom: { length: truck.boom.length, elevation: truck.boom.elevation },
  };
}

/**
 * The load footprint in the engine's boom frame (x along the boom). The load keeps the orientation it had
 * to the boom at the pick, so it turns with the slew from there.
 */
export function loadFootprint(load: LoadObject, truck: TruckObject, pickSlew: number): LiftInputIn['load']['footprint'] {
  const s = load.shape;
  if (s.kind === 'coil' && s.eye === 'vertical') return { kind: 'circle', diameter: s.outerDiameter };
  const relative = load.rotation - truck.rotation - pickSlew;
  return { kind: 'polygon', points: loadLocalOutline(s).map((p) => rotate(p, relative)) };
}

/**
 * Scene (site frame) → lift engine input (truck frame for the truck's own parts; site objects go in
 * `site` with the truck's pose, and the engine turns them into the truck frame).
 */
export function sceneToLiftInput(doc: SceneDocument, model: TruckModel | null): SceneLift {
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck');
  const load = doc.objects.find((o): o is LoadObject => o.kind === 'load');
  if (!truck) return { ok: false, problem: { kind: 'incomplete', message: 'Place the truck (T) to see the swing check.' } };
  if (!model?.spec) return { ok: false, problem: { kind: 'incomplete', message: 'This truck profile has no usable geometry, so nothing can be computed. An admin can complete it under Equipment.' } };
  if (!load) return { ok: false, problem: { kind: 'incomplete', message: 'Place the load (L) to see the swing check.' } };
  let parts;
  try {
    parts = truckToLiftParts(model.spec, truckSetup(truck));
  } catch (e) {
    if (e instanceof TruckSetupError) return { ok: false, problem: { kind: 'setup', message: e.message, field: e.field } };
    throw e;
  }
  const names: Record<string, string> = { tailboard: 'tailboard', body: 'body', cab: 'cab' };
  const obstacles = doc.objects.filter((o): o is ObstacleObject => o.kind === 'obstacle');
  const trailers = doc.objects.filter((o): o is TrailerObject => o.kind === 'trailer');
  for (const o of obstacles) names[o.id] = o.label || (o.obstacleKind === 'power-line' ? 'power line' : o.obstacleKind.replace('-', ' '));
  for (const t of trailers) names[t.id] = t.label || 'receiving trailer';
  // Names go into the engine input so that its checks carry them; results never show an object id.
  const prisms = [
    ...obstacles.filter((o) => o.shape.kind !== 'line').map((o) => ({ id: o.id, name: names[o.id], polygon: obstacleFootprints(o)[0], top: o.height })),
    ...trailers.map((t) => ({ id: t.id, name: names[t.id], polygon: trailerFootprints(t)[0], top: t.deckHeight })),
  ];
  const powerLines = obstacles.flatMap((o) => {
    const ends = wireEnds(o);
    return ends ? [{ id: o.id, name: names[o.id], a: { ...ends[0], z: o.height }, b: { ...ends[1], z: o.height }, kV: o.voltageKV }] : [];
  });
  const input: LiftInputIn = {
    supports: parts.supports,
    masses: parts.masses,
    boom: parts.boom,
    hook: { blockMass: load.blockMassKg, riggingMass: load.rigging.reduce((a, r) => a + r.massKg, 0) },
    load: { mass: loadMass(load), footprint: loadFootprint(load, truck, doc.swing.from), height: loadHeight(load.shape), hang: load.hang },
    swing: { ...doc.swing },
    bodies: parts.bodies,
    soil: { allowable: doc.soil.allowable },
    limits: { ...doc.limits },
    loadChart: parts.loadChart,
    ...(load.weightUncertainty > 0 ? { weightUncertainty: load.weightUncertainty } : {}),
    // An estimate from the dimensions gets the wider default band of the weight sensitivity.
    ...(load.massMode === 'estimate' ? { weightBasis: 'estimated' as const } : {}),
    ...(load.rigging.length
      ? {
          rigging: picksToRigging(load.rigging),
        }
      : {}),
    site: { x: truck.x, y: truck.y, heading: truck.rotation, obstacles: prisms, powerLines },
  };
  return { ok: true, input, names };
}
