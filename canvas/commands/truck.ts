import type { SceneDocument, Swing } from '../document/schema';
import type { TruckObject } from '../document/objects';
import type { Capture, Command } from './command';

const mapTruck = (doc: SceneDocument, f: (t: TruckObject) => TruckObject): SceneDocument => ({
  ...doc,
  objects: doc.objects.map((o) => (o.kind === 'truck' ? f(o) : o)),
});

export const wrapSlew = (d: number) => Math.round((((d % 360) + 360) % 360) * 1e6) / 1e6;

export const setSlew =
  (slew: number, capture: Capture): Command =>
  (doc) => ({ document: mapTruck(doc, (t) => ({ ...t, boom: { ...t.boom, slew: wrapSlew(slew) } })), capture });

export const setBoom =
  (boom: Partial<TruckObject['boom']>, capture: Capture = 'commit'): Command =>
  (doc) => ({ document: mapTruck(doc, (t) => ({ ...t, boom: { ...t.boom, ...boom } })), capture });

export const setLegExtension =
  (legId: string, extension: number, capture: Capture): Command =>
  (doc) => ({
    document: mapTruck(doc, (t) => ({ ...t, legs: { ...t.legs, [legId]: { cribbing: t.legs[legId]?.cribbing ?? null, extension: Math.max(0, extension) } } })),
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
