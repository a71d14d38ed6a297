import type { SceneDocument } from '@/lib/scene/schema';

/** What a trainer may change in the sandbox; anything left out keeps the saved value. */
export interface WhatIf {
  loadMassKg?: number;
  legs?: Record<string, { extension?: number; cribbing?: boolean }>;
  pick?: number;
  set?: number;
}

/** The mat put under a pad when the sandbox turns cribbing on where the plan had none (4 ft × 4 ft, 60 kg: example values). */
export const SANDBOX_MAT = { area: 1.44, mass: 60, label: '4 ft × 4 ft mat (what-if)' };

const norm = (a: number) => ((a % 360) + 360) % 360;

/** A new document with the what-if applied. The input is never changed (the saved scene stays as it is). */
export function applyWhatIf(doc: SceneDocument, w: WhatIf): SceneDocument {
  const objects = doc.objects.map((o) => {
    if (o.kind === 'load' && w.loadMassKg !== undefined) return { ...o, massMode: 'given' as const, massKg: Math.max(0, w.loadMassKg) };
    if (o.kind === 'truck' && w.legs) {
      const legs = { ...o.legs };
      for (const [id, change] of Object.entries(w.legs)) {
        const leg = legs[id];
        if (!leg) continue;
        legs[id] = {
          extension: change.extension !== undefined ? Math.max(0, change.extension) : leg.extension,
          cribbing: change.cribbing === undefined ? leg.cribbing : change.cribbing ? (leg.cribbing ?? SANDBOX_MAT) : null,
        };
      }
      return { ...o, legs };
    }
    return o;
  });
  const swing = { ...doc.swing, ...(w.pick !== undefined ? { from: norm(w.pick) } : {}), ...(w.set !== undefined ? { to: norm(w.set) } : {}) };
  return { ...doc, objects, swing };
}
