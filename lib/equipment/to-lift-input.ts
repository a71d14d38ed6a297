import type { Leg, TruckSpec } from './truck-spec';
import { BODY_PART_IDS } from './truck-spec';
import { toEngineLoadChart } from './load-chart';
import { padCentre } from './truck-spec-rules';
import { padLabel } from '@/lib/lift/names';

/**
 * Turns a truck profile plus how it is set up (leg extensions, cribbing, boom) into the parts of the lift
 * engine's input (issue 3 contract), all in the truck frame: origin on the ground at the slew axis,
 * x forward, y left, z up; m, kg, degrees.
 */
export interface TruckSetup {
  /** Legs that are set down, by id; a leg not listed is not in use. `extension` is metres out from retracted. */
  legs: Record<string, { extension: number; cribbing?: { area: number; mass: number } }>;
  boom: { length: number; elevation: number };
}

export class TruckSetupError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

type Pt = { x: number; y: number };

// A millimetre of slack on travel limits: a value entered as 9 ft 6 in converts with rounding.
const SLACK = 1e-3;

/** How far a leg travels from retracted to full, m. */
export const legTravel = (leg: Leg) => leg.stages.full - leg.stages.retracted;

/** Carrier frame → truck frame: a shift so the slew axis is the origin. */
export function toTruckFrame(spec: TruckSpec, p: Pt): Pt {
  return { x: p.x - spec.upper.slewAxis.x, y: p.y - spec.upper.slewAxis.y };
}

/** Pad centre in the truck frame with the leg `extension` metres out from retracted. */
export function padPosition(spec: TruckSpec, leg: Leg, extension: number): Pt {
  return toTruckFrame(spec, padCentre(leg, leg.stages.retracted + extension));
}

/** The body outline parts as rectangles in the truck frame, counter-clockwise from rear-right. */
export function bodyPolygons(spec: TruckSpec) {
  return BODY_PART_IDS.map((id) => {
    const p = spec.carrier[id];
    const h = p.width / 2;
    const corners: Pt[] = [
      { x: p.rear, y: -h },
      { x: p.front, y: -h },
      { x: p.front, y: h },
      { x: p.rear, y: h },
    ];
    return { id, polygon: corners.map((c) => toTruckFrame(spec, c)), top: p.top };
  });
}

/** Boom CG fraction at a length: linear between the stage rows (a physical quantity, not a rating). */
export function boomCgFraction(spec: TruckSpec, length: number): number {
  const st = spec.boom.stages;
  if (length <= st[0].length) return st[0].cgFraction;
  for (let i = 1; i < st.length; i++) {
    if (length <= st[i].length) {
      const t = (length - st[i - 1].length) / (st[i].length - st[i - 1].length);
      return st[i - 1].cgFraction + t * (st[i].cgFraction - st[i - 1].cgFraction);
    }
  }
  return st[st.length - 1].cgFraction;
}

function checkSetup(spec: TruckSpec, setup: TruckSetup) {
  for (const [id, s] of Object.entries(setup.legs)) {
    const leg = spec.outriggers.legs.find((l) => l.id === id);
    if (!leg) throw new TruckSetupError(`legs.${id}`, `This truck has no ${padLabel(id)} leg`);
    const travel = legTravel(leg);
    if (!Number.isFinite(s.extension) || s.extension < -SLACK || s.extension > travel + SLACK) {
      throw new TruckSetupError(`legs.${id}.extension`, `The ${padLabel(id)} leg extends from 0 to ${travel.toFixed(3)} m; ${s.extension} m is outside that`);
    }
    if (s.cribbing && (!(s.cribbing.area > 0) || !(s.cribbing.mass >= 0))) {
      throw new TruckSetupError(`legs.${id}.cribbing`, `The cribbing under the ${padLabel(id)} leg needs an area above 0 and a mass of 0 or more`);
    }
  }
  const st = spec.boom.stages;
  const { length, elevation } = setup.boom;
  if (!(length >= st[0].length - SLACK && length <= st[st.length - 1].length + SLACK)) {
    throw new TruckSetupError('boom.length', `Boom length runs from ${st[0].length} m to ${st[st.length - 1].length} m; ${length} m is outside that`);
  }
  const e = spec.boom.elevation;
  if (!(elevation >= e.min && elevation <= e.max)) {
    throw new TruckSetupError('boom.elevation', `Boom elevation runs from ${e.min}° to ${e.max}°; ${elevation}° is outside that`);
  }
}

export function truckToLiftParts(spec: TruckSpec, setup: TruckSetup) {
  checkSetup(spec, setup);
  const supports = spec.outriggers.legs
    .filter((leg) => setup.legs[leg.id])
    .map((leg) => {
      const s = setup.legs[leg.id];
      const extension = Math.min(Math.max(s.extension, 0), legTravel(leg));
      const p = padPosition(spec, leg, extension);
      return {
        id: leg.id,
        x: p.x,
        y: p.y,
        area: leg.pad.length * leg.pad.width,
        ...(s.cribbing && { cribbingArea: s.cribbing.area, cribbingMass: s.cribbing.mass }),
      };
    });
  const cg = spec.carrier.cg;
  const carrierAt = toTruckFrame(spec, cg);
  const masses = [
    { id: 'carrier', mass: spec.carrier.mass, x: carrierAt.x, y: carrierAt.y, z: cg.z, rotates: false },
    { id: 'turret', mass: spec.upper.turret.mass, ...spec.upper.turret.cg, rotates: true },
    ...(spec.upper.counterweight.mass > 0 ? [{ id: 'counterweight', mass: spec.upper.counterweight.mass, ...spec.upper.counterweight.cg, rotates: true }] : []),
  ].filter((m) => m.mass > 0);
  const boom = {
    pivot: { ...spec.boom.pivot },
    length: setup.boom.length,
    elevation: setup.boom.elevation,
    mass: spec.boom.mass,
    cgFraction: boomCgFraction(spec, setup.boom.length),
    ...(spec.boom.width !== undefined ? { width: spec.boom.width } : {}),
  };
  const padRatings = Object.fromEntries(spec.outriggers.legs.filter((l) => setup.legs[l.id]).map((l) => [l.id, l.padRating]));
  return { supports, masses, boom, bodies: bodyPolygons(spec), padRatings, loadChart: toEngineLoadChart(spec.loadChart) };
}
export type TruckLiftParts = ReturnType<typeof truckToLiftParts>;
