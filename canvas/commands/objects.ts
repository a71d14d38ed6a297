import { wrap360 } from '@/lib/angles';
import type { SceneDocument } from '@/lib/scene/schema';
import type { SceneObject } from '@/lib/scene/objects';
import { type Capture, type Command } from './command';

const mapSelected = (doc: SceneDocument, ids: readonly string[], f: (o: SceneObject) => SceneObject): SceneDocument => {
  const set = new Set(ids);
  return { ...doc, objects: doc.objects.map((o) => (set.has(o.id) ? f(o) : o)) };
};

export const addObjects =
  (objects: SceneObject[]): Command =>
  (doc) => ({ document: { ...doc, objects: [...doc.objects, ...objects] }, capture: 'commit' });

/** Replaces fields of one object (the inspector's exact edits, and every handle drag). */
export const updateObject =
  (id: string, patch: Partial<SceneObject> | ((o: SceneObject) => SceneObject), capture: Capture = 'commit'): Command =>
  (doc) => ({
    document: mapSelected(doc, [id], (o) => (typeof patch === 'function' ? patch(o) : ({ ...o, ...patch } as SceneObject))),
    capture,
  });

/** Moves objects from their positions in `from` by (dx, dy); locked objects stay put. */
export const moveObjects =
  (from: SceneDocument, ids: readonly string[], dx: number, dy: number, capture: Capture): Command =>
  (doc) => {
    const start = new Map(from.objects.map((o) => [o.id, o]));
    return {
      document: mapSelected(doc, ids, (o) => {
        const s = start.get(o.id) ?? o;
        if (o.locked) return o;
        const moved = { ...o, x: s.x + dx, y: s.y + dy };
        if (o.kind === 'tape' && s.kind === 'tape') return { ...moved, x2: s.x2 + dx, y2: s.y2 + dy } as SceneObject;
        return moved as SceneObject;
      }),
      capture,
    };
  };

/** Turns objects about a centre by `deg` from their rotations in `from`. */
export const rotateObjects =
  (from: SceneDocument, ids: readonly string[], centre: { x: number; y: number }, deg: number, capture: Capture): Command =>
  (doc) => {
    const start = new Map(from.objects.map((o) => [o.id, o]));
    const c = Math.cos((deg * Math.PI) / 180);
    const s = Math.sin((deg * Math.PI) / 180);
    const turn = (x: number, y: number) => ({ x: centre.x + c * (x - centre.x) - s * (y - centre.y), y: centre.y + s * (x - centre.x) + c * (y - centre.y) });
    return {
      document: mapSelected(doc, ids, (o) => {
        const st = start.get(o.id) ?? o;
        if (o.locked) return o;
        const p = turn(st.x, st.y);
        if (o.kind === 'tape' && st.kind === 'tape') {
          const q = turn(st.x2, st.y2);
          return { ...o, x: p.x, y: p.y, x2: q.x, y2: q.y };
        }
        return { ...o, x: p.x, y: p.y, rotation: normalise(st.rotation + deg) } as SceneObject;
      }),
      capture,
    };
  };

const normalise = (d: number) => Math.round(wrap360(d) * 1e9) / 1e9;

export const deleteObjects =
  (ids: readonly string[]): Command =>
  (doc) => {
    const set = new Set(ids);
    return { document: { ...doc, objects: doc.objects.filter((o) => !set.has(o.id) || o.locked) }, capture: 'commit' };
  };

export const setLocked =
  (ids: readonly string[], locked: boolean): Command =>
  (doc) => ({ document: mapSelected(doc, ids, (o) => ({ ...o, locked }) as SceneObject), capture: 'commit' });

/** Copies with fresh ids, offset so they do not sit exactly on the originals. One truck and one load at most. */
export function cloneObjects(doc: SceneDocument, objects: readonly SceneObject[], offset: number, newId: () => string): SceneObject[] {
  const hasTruck = doc.objects.some((o) => o.kind === 'truck');
  const hasLoad = doc.objects.some((o) => o.kind === 'load');
  return objects
    .filter((o) => !(o.kind === 'truck' && hasTruck) && !(o.kind === 'load' && hasLoad))
    .map((o) => {
      const c = { ...structuredClone(o), id: newId(), x: o.x + offset, y: o.y - offset, locked: false } as SceneObject;
      if (c.kind === 'tape' && o.kind === 'tape') {
        c.x2 = o.x2 + offset;
        c.y2 = o.y2 - offset;
      }
      return c;
    });
}
