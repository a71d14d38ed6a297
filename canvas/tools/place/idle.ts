import { addObjects } from '../../commands/objects';
import { aimBoom } from '../../commands/aim';
import { newObject } from '@/lib/scene/factories';
import { newId } from '@/lib/scene/ids';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import type { ToolState } from '../tool-state';

/** Waiting for the press that puts the chosen kind of object down; then back to selecting it. */
export const placeIdle: ToolState = {
  id: 'place.idle',
  pointerDown(ed, e) {
    const s = ed.state;
    const kind = s.placeKind;
    if (!kind || s.readOnly) return ed.transition('select.idle');
    const at = e.alt ? e.world : ed.snapPoint(e.world);
    const existing = s.document.objects.find((o) => (kind === 'truck' && o.kind === 'truck') || (kind.startsWith('load') && o.kind === 'load'));
    if (existing) {
      // One truck and one load per scene: placing again moves the existing one.
      ed.run((doc) => ({ document: { ...doc, objects: doc.objects.map((o) => (o.id === existing.id ? { ...o, x: at.x, y: at.y } : o)) }, capture: 'commit' }));
      ed.set({ selection: [existing.id], placeKind: null });
      return ed.transition('select.idle');
    }
    const profile = s.profiles[0];
    const truck = profile ? { profileId: profile.id, profileVersion: profile.version, model: truckModelFromProfile(profile) } : null;
    const obj = newObject(kind, newId(kind.split('-')[0]), at, truck, ed.state.units);
    if (!obj) return ed.transition('select.idle');
    ed.run((doc) => {
      const added = addObjects([obj])(doc).document;
      const model = ed.state.truck;
      if (obj.kind === 'load' && model) return { document: aimBoom(added, model, obj, 'from'), capture: 'commit' };
      if (obj.kind === 'trailer' && model) {
        const aimed = aimBoom(added, model, obj, 'to');
        // Aiming at the set point only sets the swing's end; the boom stays where it was.
        return { document: { ...aimed, objects: added.objects }, capture: 'commit' };
      }
      return { document: added, capture: 'commit' };
    });
    ed.set({ selection: [obj.id], placeKind: null });
    ed.transition('select.idle');
  },
  keyDown(ed, e) {
    if (e.key !== 'Escape') return;
    ed.set({ placeKind: null });
    ed.transition('select.idle');
    return true;
  },
  cancel(ed) {
    ed.set({ placeKind: null });
    ed.transition('select.idle');
  },
};
