import { sceneDocumentSchema, type SceneDocument, type SceneDocumentIn } from '@/lib/scene/schema';
import { truckModelFromSpec } from '@/lib/scene/truck/from-spec';
import { HR7_SPEC } from '@/db/seed/demo-trucks';

export const hr7Model = () => truckModelFromSpec({ id: 1, version: 1, name: 'HR-7', unitNumber: 'HR-7', spec: HR7_SPEC }, HR7_SPEC);

/** HR-7 with a load chart three times as generous (invented), so that stability decides a placement. */
export function strongChartModel() {
  const spec = { ...HR7_SPEC, loadChart: { ...HR7_SPEC.loadChart, rated: HR7_SPEC.loadChart.rated.map((row) => row.map((v) => (v === null ? null : 3 * v))) } };
  return truckModelFromSpec({ id: 1, version: 1, name: 'HR-7 (strong chart)', unitNumber: 'HR-7', spec }, spec);
}

const base = { rotation: 0, locked: false, label: '' };
const mat = { area: 1.44, mass: 60, label: 'mat' };

/**
 * An invented site that is its own mirror image about the x axis: a load picked 9 m north of the road's
 * centreline and set 9 m south, swung clockwise over the east, on a usable strip of road 12 m wide.
 * Mirroring maps a placement (x, y, heading) to (x, −y, −heading) and keeps the swept slews, so a unique
 * best placement has heading 0° or 180°. The truck's rear tipping line is nearest its slew axis (pads
 * 2 m behind it, 5.3 m in front, 3.5 m to the sides), so the swing is strongest over the cab: 0°.
 */
export function mirrorSite(): SceneDocument {
  const doc: SceneDocumentIn = {
    version: 3,
    objects: [
      { ...base, id: 'truck', kind: 'truck', x: -3, y: 1, rotation: 30, profileId: 1, profileVersion: 1,
        legs: { FL: { extension: 2.2, cribbing: mat }, FR: { extension: 2.2, cribbing: mat }, RL: { extension: 2.2, cribbing: mat }, RR: { extension: 2.2, cribbing: mat } },
        boom: { slew: 90, elevation: 30, length: 10.4 } },
      { ...base, id: 'crate', kind: 'load', x: 0, y: 9, shape: { kind: 'box', length: 2, width: 1.5, height: 1.5 }, massMode: 'given', massKg: 3000, hang: 1, blockMassKg: 120 },
    ],
    swing: { from: 90, to: 270, direction: 'cw' },
    // Firm ground (invented), so that stability, not pad pressure, decides the placement.
    soil: { preset: 'custom', allowable: 2000 },
    limits: { percentOfTipping: 85, clearance: 0.3, percentOfRated: 100 },
    usableArea: [{ x: -12, y: -4.3 }, { x: 12, y: -4.3 }, { x: 12, y: 4.3 }, { x: -12, y: 4.3 }],
  };
  return sceneDocumentSchema.parse(doc);
}
