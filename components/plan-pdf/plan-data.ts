import type { LiftResult } from '@/lib/lift';
import type { UnitSystem } from '@/lib/units';
import type { PlanDetails } from '@/lib/plan-details/schema';
import type { SceneDocument } from '@/lib/scene/schema';
import type { LoadObject, RiggingPick, TruckObject } from '@/lib/scene/objects';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';
import { drawingAnalysis } from '@/canvas/export/revision-analysis';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import { planDrawing } from '@/canvas/export/plan-drawing';
import type { PlanDrawing } from '@/canvas/export/drawing-types';
import { loadMass } from '@/lib/scene/geometry/load';

/** Everything the plan document shows, computed once on the server for one saved revision. */
export interface PlanMeta {
  sceneId: number;
  organisation: string;
  title: string;
  revision: number;
  latestRevision: number;
  /** The scene's status now, and whether the revision shown is the approved one. */
  status: string;
  approved: boolean;
  /** Who saved this revision, and when (ISO). */
  savedBy: string;
  savedAt: string;
  generatedAt: string;
  units: UnitSystem;
}

export interface SignOffDecision {
  /** "Approved", "Returned for changes": the review workflow's own words. */
  action: string;
  by: string;
  /** The decider's role ("supervisor", "admin"). */
  role: string;
  at: string;
  conditions: string;
  /** The written reason for approving beyond the plan's own stricter limits ('' when none was needed). */
  reason: string;
}

export interface RiggingRow {
  pick: RiggingPick;
  /** The engine's verdict for the item (demand and capacity, kg), when it analysed one. */
  demandKg: number | null;
  capacityKg: number | null;
  lastInspection: string | null;
  nextDue: string | null;
}

export interface PlanData {
  meta: PlanMeta;
  doc: SceneDocument;
  truck: TruckObject | null;
  truckName: string | null;
  /** The profile's winches (rated line pull as the mass held, kg; most parts of line it reeves). */
  winches: { name: string; ratedLinePull: number; maxParts: number }[];
  profile: { id: number; version: number; unitNumber: string | null } | null;
  load: LoadObject | null;
  loadMassKg: number | null;
  result: LiftResult | null;
  problem: string | null;
  names: Record<string, string>;
  /** Pad and cribbing areas per support id, m² (from the truck profile and the sketch). */
  padAreas: Record<string, { pad: number; cribbing: number | null; cribbingLabel: string }>;
  rigging: RiggingRow[];
  drawing: PlanDrawing | null;
  details: PlanDetails;
  signOff: SignOffDecision[];
}

export interface PlanInputs {
  meta: PlanMeta;
  doc: SceneDocument;
  profile: TruckProfileInput | null;
  /** The server's computation of this revision (lib/server/scene-analysis), or why there is none. */
  analysis: { ok: true; result: LiftResult; names: Record<string, string> } | { ok: false; message: string };
  details: PlanDetails;
  /** By inventory id, and by tag for picks copied without an id. */
  inspections: Map<number | string, { lastInspection: string | null; nextDue: string | null }>;
  signOff: SignOffDecision[];
}

/** The drawing's box on the page, points (Letter, inside the margins, above the legend). */
export const DRAWING_BOX = { width: 540, height: 540 } as const;

export function buildPlanData(i: PlanInputs): PlanData {
  const { doc, meta } = i;
  const model = i.profile ? truckModelFromProfile(i.profile) : null;
  const truck = doc.objects.find((o): o is TruckObject => o.kind === 'truck') ?? null;
  const load = doc.objects.find((o): o is LoadObject => o.kind === 'load') ?? null;
  const result = i.analysis.ok ? i.analysis.result : null;
  const names = i.analysis.ok ? i.analysis.names : {};
  const padAreas: PlanData['padAreas'] = {};
  if (model && truck) {
    for (const leg of model.legs) {
      const crib = truck.legs[leg.id]?.cribbing ?? null;
      padAreas[leg.id] = { pad: leg.pad.length * leg.pad.width, cribbing: crib?.area ?? null, cribbingLabel: crib?.label ?? '' };
    }
  }
  const rigging: RiggingRow[] = (load?.rigging ?? []).map((pick) => {
    const v = result?.rigging.find((r) => r.id === pick.tag && r.element !== 'winch');
    const insp = i.inspections.get(pick.itemId ?? pick.tag);
    return { pick, demandKg: v?.demand ?? null, capacityKg: v?.capacity ?? null, lastInspection: insp?.lastInspection ?? null, nextDue: insp?.nextDue ?? null };
  });
  const live = model && result ? drawingAnalysis(doc, model, result) : null;
  const drawing = live && model ? planDrawing({ doc, model, analysis: live, names, units: meta.units, ...DRAWING_BOX }) : null;
  return {
    meta,
    doc,
    truck,
    truckName: model?.name ?? null,
    winches: (model?.spec?.winches ?? []).map((w) => ({ name: w.name, ratedLinePull: w.ratedLinePull, maxParts: w.maxParts })),
    profile: i.profile ? { id: i.profile.id, version: i.profile.version, unitNumber: i.profile.unitNumber } : null,
    load,
    loadMassKg: load ? loadMass(load) : null,
    result,
    problem: i.analysis.ok ? null : i.analysis.message,
    names,
    padAreas,
    rigging,
    drawing,
    details: i.details,
    signOff: i.signOff,
  };
}
