import { wrap360 } from '@/lib/angles';
import type { SceneDocument, Swing } from '@/lib/scene/schema';
import { legSetupSchema, type TruckObject } from '@/lib/scene/objects';
import type { Capture, Command } from './command';
import { maxExtension, type TruckModel } from '@/lib/scene/truck/truck-model';

const mapTruck = (doc: SceneDocument, f: (t: TruckObject) => TruckObject): SceneDocument => ({
  ...doc,
  objects: doc.objects.map((o) => (o.kind === 'truck' ? f(o) : o)),
});

export const wrapSlew = (d: number) => Math.round(wrap360(d) * 1e6) / 1e6;

export const setSlew =
  (slew: number, capture: Capture): Command =>
  (doc) => ({ document: mapTruck(doc, (t) => ({ ...t, boom: { ...t.boom, slew: wrapSlew(slew) } })), capture });

export const setBoom =
  (boom: Partial<TruckObject['boom']>, capture: Capture = 'commit'): Command =>
  (doc) => ({ document: mapTruck(doc, (t) => ({ ...t, boom: { ...t.boom, ...boom } })), capture });

/** The document's own bound on an extension, so no edit leaves a document the schema refuses. */
const EXTENSION_MAX = legSetupSchema.shape.extension.maxValue ?? 15;

export const setLegExtension =
  (legId: string, extension: number, capture: Capture): Command =>
  (doc) => ({
    document: mapTruck(doc, (t) => ({ ...t, legs: { ...t.legs, [legId]: { cribbing: t.legs[legId]?.cribbing ?? null, extension: Math.min(EXTENSION_MAX, Math.max(0, extension)) } } })),
    capture,
  });

export const setLegCribbing =
  (legId: string, cribbing: TruckObject['legs'][string]['cribbing']): Command =>
  (doc) => ({
    document: mapTruck(doc, (t) => ({ ...t, legs: { ...t.legs, [legId]: { extension: t.legs[legId]?.extension ?? 0, cribbing } } })),
    capture: 'commit',
  });

export const setSwing =
  (swing: Partial<Swing>): Command =>
  (doc) => ({ document: { ...doc, swing: { ...doc.swing, ...swing } }, capture: 'commit' });

export const setDocumentFields =
  (patch: Partial<Pick<SceneDocument, 'soil' | 'limits' | 'grid' | 'unitsHint' | 'background'>>): Command =>
  (doc) => ({ document: { ...doc, ...patch }, capture: 'commit' });

/**
 * Moves the plan's truck to another version of its profile (one undo step). Leg settings carry over for
 * legs the version still has, clamped to their new reach; new legs start fully out without cribbing; the
 * boom is kept within the version's length and elevation ranges.
 */
export const moveTruckToProfileVersion =
  (model: TruckModel): Command =>
  (doc) => ({
    document: mapTruck(doc, (t) => {
      const legs = Object.fromEntries(
        model.legs.map((l) => {
          const old = t.legs[l.id];
          return [l.id, old ? { extension: Math.min(old.extension, maxExtension(l)), cribbing: old.cribbing } : { extension: maxExtension(l), cribbing: null }];
        }),
      );
      const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));
      const boom = { ...t.boom, length: clamp(t.boom.length, model.boom.minLength, model.boom.maxLength), elevation: clamp(t.boom.elevation, model.boom.minElevation, model.boom.maxElevation) };
      return { ...t, profileId: model.profileId, profileVersion: model.profileVersion, legs, boom };
    }),
    capture: 'commit',
  });
