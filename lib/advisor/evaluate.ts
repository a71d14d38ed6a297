import { analyzeLift } from '@/lib/lift/analyze';
import { analyzeCoarse, coarseCeiling, coarseMargins, limitsOf } from '@/lib/lift/coarse';
import { leastMargin, resultMargins } from '@/lib/lift/margins';
import { prepareLift, type PreparedLift } from '@/lib/lift/prepare';
import type { LiftResult } from '@/lib/lift/result';
import type { LiftInput } from '@/lib/lift/schema';
import { parseLiftInput, withParsedParts } from '@/lib/lift/validate';
import { boomCgFraction } from '@/lib/equipment/to-lift-input';
import { truckToLiftParts } from '@/lib/equipment/to-lift-input';
import type { TruckSpec } from '@/lib/equipment/truck-spec';
import { boomFor, slewToward } from '@/lib/scene/aim';
import type { LoadObject, TruckObject } from '@/lib/scene/objects';
import type { SceneDocument } from '@/lib/scene/schema';
import { loadFootprint, sceneToLiftInput, truckSetup } from '@/lib/scene/to-lift-input';
import type { TruckLegModel, TruckModel } from '@/lib/scene/truck/truck-model';
import type { Pt } from '@/lib/scene/geometry/vec';
import { AdvisorInputError, type Placement, type PlacementFigures } from './types';

/**
 * Scores placements. A placement becomes a scene: the truck moved and turned, its legs set, the boom
 * set for the farther of the pick and set points (the engine keeps one hook radius over the swing, so
 * the farther, more demanding one is checked) and the swing running from the pick's slew to the set's.
 * `coarse` scores it with the engine's coarse mode on a re-used parsed input (no re-validation); `exact`
 * runs the full analysis on the scene, exactly as the editor does.
 */
export class Evaluator {
  readonly truck: TruckObject;
  readonly load: LoadObject;
  readonly legs: TruckLegModel[];
  readonly spec: TruckSpec;
  private readonly base: LiftInput;
  private readonly supportsByLegs = new Map<string, LiftInput['supports']>();
  coarseCount = 0;
  exactCount = 0;
  /** Placements left out after their ceiling (coarseCeiling) showed they could not beat the best so far. */
  skippedCount = 0;

  constructor(
    readonly document: SceneDocument,
    readonly model: TruckModel,
    readonly pick: Pt,
    readonly set: Pt,
  ) {
    const truck = document.objects.find((o): o is TruckObject => o.kind === 'truck');
    const load = document.objects.find((o): o is LoadObject => o.kind === 'load');
    const lift = sceneToLiftInput(document, model);
    if (!truck || !load || !model.spec || !lift.ok) throw new AdvisorInputError(lift.ok ? 'The scene needs a truck and a load.' : lift.problem.message);
    this.truck = truck;
    this.load = load;
    this.spec = model.spec;
    // The legs the plan sets down; a truck placed with none uses them all.
    const inUse = Object.keys(truck.legs);
    this.legs = model.legs.filter((l) => inUse.length === 0 || inUse.includes(l.id));
    this.base = parseLiftInput(lift.input);
  }

  /** The scene's own placement. */
  startPlacement(): Placement {
    const t = this.truck;
    return { x: t.x, y: t.y, heading: t.rotation, extensions: this.legs.map((l) => t.legs[l.id]?.extension ?? 0) };
  }

  /** The scene with a placement applied (cribbing kept under each leg). */
  documentFor(pl: Placement): SceneDocument {
    const at = { x: pl.x, y: pl.y, rotation: pl.heading };
    const from = slewToward(at, this.pick);
    const to = slewToward(at, this.set);
    const radius = Math.max(Math.hypot(this.pick.x - pl.x, this.pick.y - pl.y), Math.hypot(this.set.x - pl.x, this.set.y - pl.y));
    const legs = Object.fromEntries(this.legs.map((l, i) => [l.id, { extension: pl.extensions[i], cribbing: this.truck.legs[l.id]?.cribbing ?? null }]));
    const truck: TruckObject = { ...this.truck, ...at, legs, boom: { slew: from, ...boomFor(this.model, this.truck.boom.length, radius) } };
    return {
      ...this.document,
      objects: this.document.objects.map((o) => (o.id === truck.id ? truck : o)),
      swing: { ...this.document.swing, from, to },
    };
  }

  private supports(pl: Placement): LiftInput['supports'] {
    const key = pl.extensions.map((e) => e.toFixed(4)).join();
    let s = this.supportsByLegs.get(key);
    if (!s) {
      const legs = Object.fromEntries(this.legs.map((l, i) => [l.id, { extension: pl.extensions[i], cribbing: this.truck.legs[l.id]?.cribbing ?? null }]));
      const parts = truckToLiftParts(this.spec, truckSetup({ ...this.truck, legs }));
      s = parseLiftInput({ ...this.base, supports: parts.supports }).supports;
      this.supportsByLegs.set(key, s);
    }
    return s;
  }

  /**
   * Least margin from the coarse mode (never above the exact one); −Infinity when it cannot stand. With a
   * `floor`, a placement whose ceiling (coarseCeiling) is at or below it is not analysed further: the
   * ceiling is returned, which is at or below the floor, so "better than the floor" is decided the same way.
   */
  coarse(pl: Placement, floor = -Infinity): number {
    const p = this.prepared(pl);
    if (!p) return -Infinity;
    if (floor > -Infinity) {
      const ceiling = this.ceiling(p);
      if (ceiling <= floor) {
        this.skippedCount++;
        return ceiling;
      }
    }
    return this.coarsePrepared(p);
  }

  /** The engine input of a placement, prepared; null when the engine refuses it (the supports enclose no area). */
  prepared(pl: Placement): PreparedLift | null {
    const doc = this.documentFor(pl);
    const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck')!;
    try {
      const input = withParsedParts(this.base, {
        supports: this.supports(pl),
        boom: { ...this.base.boom, length: truck.boom.length, elevation: truck.boom.elevation, cgFraction: boomCgFraction(this.spec, truck.boom.length) },
        load: { ...this.base.load, footprint: loadFootprint(this.load, truck, doc.swing.from) as LiftInput['load']['footprint'] },
        swing: { ...doc.swing },
        site: { ...this.base.site!, x: pl.x, y: pl.y, heading: pl.heading },
      });
      return prepareLift(input);
    } catch {
      return null;
    }
  }

  /** coarseCeiling of a prepared placement; −Infinity when the truck would tip with nothing on the hook. */
  ceiling(p: PreparedLift): number {
    try {
      return coarseCeiling(p);
    } catch {
      return -Infinity;
    }
  }

  /** The coarse least margin of a prepared placement; −Infinity when the truck would tip with nothing on the hook. */
  coarsePrepared(p: PreparedLift): number {
    this.coarseCount++;
    try {
      return leastMargin(coarseMargins(analyzeCoarse(p), limitsOf(p))).margin;
    } catch {
      return -Infinity;
    }
  }

  /** The full analysis of a scene and its least margin; null when the engine refuses it. */
  exact(doc: SceneDocument): { result: LiftResult; least: { check: string; margin: number } } | null {
    this.exactCount++;
    const lift = sceneToLiftInput(doc, this.model);
    if (!lift.ok) return null;
    try {
      const result = analyzeLift(lift.input, { sensitivity: false });
      const least = leastMargin(resultMargins(result));
      return { result, least: { check: least.id, margin: least.margin } };
    } catch {
      return null;
    }
  }
}

/** The headline figures of an exact analysis. */
export function figuresOf(r: LiftResult, doc: SceneDocument): PlacementFigures {
  const pads = [...r.reactions.maxima].sort((a, b) => b.pressure - a.pressure);
  const clear = r.checks.filter((c) => c.code === 'clearance' && c.value !== null).sort((a, b) => a.value! - b.value!)[0];
  const line = [...r.powerLines].sort((a, b) => a.distance - (a.required ?? 0) - (b.distance - (b.required ?? 0)))[0];
  return {
    percentOfTipping: r.worstCase.percentOfTipping,
    tippingLimit: doc.limits.percentOfTipping,
    loadChartPercent: r.loadChart?.percent ?? null,
    ratedLimit: doc.limits.percentOfRated,
    highestPad: pads[0] ? { support: pads[0].support, name: pads[0].name, pressure: pads[0].pressure } : null,
    allowable: doc.soil.allowable,
    nearestClearance: clear ? { target: clear.subject.ids[0], name: clear.subject.names[0], distance: clear.value! } : null,
    clearanceLimit: doc.limits.clearance,
    nearestPowerLine: line ? { id: line.id, name: line.name, distance: line.distance, required: line.required } : null,
  };
}
