import { describe, expect, it } from 'vitest';
import { TestEditor } from './test-editor';
import { sceneDocumentSchema } from '@/lib/scene/schema';
import { hookSitePoint } from '@/lib/scene/geometry/truck';
import { maxExtension } from '@/lib/scene/truck/truck-model';

/** A scene with the truck at the origin heading east and an obstacle to its north-east. */
function withTruckAndShed() {
  const t = new TestEditor();
  t.tool('truck').click(0, 0).expectToBeIn('select.idle');
  t.tool('obstacle-rect').click(20, 20).expectToBeIn('select.idle');
  return t;
}

describe('placing', () => {
  it('places the truck from the profile with every leg fully out, and selects it', () => {
    const t = new TestEditor().tool('truck').expectToBeIn('place.idle').click(3.1, -1.4);
    const [truck] = t.byKind('truck');
    // Grid 1.524 m (5 ft): 3.1 m snaps to 2 × 1.524 = 3.048, −1.4 to −1.524.
    expect(truck.x).toBeCloseTo(3.048, 9);
    expect(truck.y).toBeCloseTo(-1.524, 9);
    expect(truck.profileId).toBe(7);
    expect(truck.profileVersion).toBe(3);
    const legs = t.state.truck!.legs;
    expect(Object.keys(truck.legs).sort()).toEqual(legs.map((l) => l.id).sort());
    for (const l of legs) expect(truck.legs[l.id].extension).toBeCloseTo(maxExtension(l), 9);
    expect(t.state.selection).toEqual([truck.id]);
  });

  it('placing a load points the boom at it and makes that the pick angle', () => {
    const t = new TestEditor().tool('truck').click(0, 0).tool('load-coil').click(0, 9.144, { alt: true });
    const [truck] = t.byKind('truck');
    expect(truck.boom.slew).toBeCloseTo(90, 6);
    expect(t.doc.swing.from).toBeCloseTo(90, 6);
    const hook = hookSitePoint(truck, t.state.truck!, truck.boom.slew);
    // Elevation is rounded to 0.1°, so the hook lands within a few centimetres of the coil.
    expect(Math.hypot(hook.x - 0, hook.y - 9.144)).toBeLessThan(0.05);
  });

  it('a second truck placement moves the one truck instead of adding another', () => {
    const t = new TestEditor().tool('truck').click(0, 0).tool('truck').click(10, 0, { alt: true });
    expect(t.byKind('truck')).toHaveLength(1);
    expect(t.byKind('truck')[0].x).toBe(10);
  });

  it('draws a polygon obstacle corner by corner and closes it with Enter', () => {
    const t = new TestEditor().tool('obstacle-polygon').expectToBeIn('place.polygon');
    t.click(0, 0, { alt: true }).click(6, 0, { alt: true }).click(6, 4, { alt: true }).keyDown('Enter').expectToBeIn('select.idle');
    const [o] = t.byKind('obstacle');
    expect(o.shape.kind).toBe('polygon');
    expect(o.x).toBeCloseTo(4, 9);
    expect(o.y).toBeCloseTo(4 / 3, 9);
  });
});

describe('moving and undo', () => {
  it('one drag is one undo step, however many frames it took', () => {
    const t = withTruckAndShed();
    const shed = t.byKind('obstacle')[0];
    const before = t.state.undoStack.length;
    t.drag([shed.x, shed.y], [shed.x + 4.572, shed.y], {}, 30);
    expect(t.obj(shed.id).x).toBeCloseTo(shed.x + 4.572, 9);
    expect(t.state.undoStack.length).toBe(before + 1);
    t.keyDown('z', { mod: true });
    expect(t.obj(shed.id).x).toBeCloseTo(shed.x, 9);
    t.keyDown('z', { mod: true, shift: true });
    expect(t.obj(shed.id).x).toBeCloseTo(shed.x + 4.572, 9);
  });

  it('moves through pointing → dragging → idle, and a short press is just a click', () => {
    const t = withTruckAndShed();
    const shed = t.byKind('obstacle')[0];
    t.pointerDown(shed.x, shed.y).expectToBeIn('select.pointing');
    t.pointerMove(shed.x + 0.05, shed.y).expectToBeIn('select.pointing');
    t.pointerMove(shed.x + 3, shed.y).expectToBeIn('select.dragging');
    t.pointerUp(shed.x + 3, shed.y).expectToBeIn('select.idle');
  });

  it('snaps the dragged object onto the grid, and Alt moves it freely', () => {
    const t = withTruckAndShed();
    const shed = t.byKind('obstacle')[0];
    t.drag([shed.x, shed.y], [shed.x + 2.0, shed.y + 0.4]);
    const g = 1.524;
    expect(t.obj(shed.id).x / g).toBeCloseTo(Math.round(t.obj(shed.id).x / g), 9);
    expect(t.obj(shed.id).y / g).toBeCloseTo(Math.round(t.obj(shed.id).y / g), 9);
    const at = t.obj(shed.id);
    t.drag([at.x, at.y], [at.x + 0.37, at.y], { alt: true });
    expect(t.obj(shed.id).x).toBeCloseTo(at.x + 0.37, 9);
  });

  it('Escape during a drag puts everything back and leaves no undo step', () => {
    const t = withTruckAndShed();
    const shed = t.byKind('obstacle')[0];
    const steps = t.state.undoStack.length;
    t.pointerDown(shed.x, shed.y).pointerMove(shed.x + 6, shed.y).pointerMove(shed.x + 9, shed.y).keyDown('Escape');
    t.expectToBeIn('select.idle');
    expect(t.obj(shed.id).x).toBe(shed.x);
    expect(t.state.undoStack.length).toBe(steps);
  });

  it('a locked object cannot be moved or deleted', () => {
    const t = withTruckAndShed();
    const shed = t.byKind('obstacle')[0];
    t.click(shed.x, shed.y).keyDown('l', { mod: true });
    expect(t.obj(shed.id).locked).toBe(true);
    t.drag([shed.x, shed.y], [shed.x + 6, shed.y]).keyDown('Delete');
    expect(t.obj(shed.id).x).toBe(shed.x);
  });
});

describe('rotating', () => {
  it('turns with the rotate handle in 15° steps, and Shift turns freely', () => {
    const t = withTruckAndShed();
    const shed = t.byKind('obstacle')[0];
    t.click(shed.x, shed.y);
    const handle = t.editor.handles().find((h) => h.kind === 'rotate')!;
    // Drag the handle (due east of the centre) round to 37° north of east: snaps to 30°.
    const r = Math.hypot(handle.at.x - shed.x, handle.at.y - shed.y);
    const to = (deg: number): [number, number] => [shed.x + r * Math.cos((deg * Math.PI) / 180), shed.y + r * Math.sin((deg * Math.PI) / 180)];
    t.pointerDown(handle.at.x, handle.at.y).expectToBeIn('select.rotating');
    t.pointerMove(...to(20)).pointerMove(...to(37)).pointerUp(...to(37));
    expect(t.obj(shed.id).rotation).toBeCloseTo(30, 6);
    const h2 = t.editor.handles().find((h) => h.kind === 'rotate')!;
    t.pointerDown(h2.at.x, h2.at.y, { shift: true }).pointerMove(...to(52), { shift: true }).pointerUp(...to(52), { shift: true });
    expect(t.obj(shed.id).rotation).toBeCloseTo(52, 6);
  });

  it('drags the boom tip round to slew, in whole degrees, as one undo step', () => {
    const t = new TestEditor().tool('truck').click(0, 0);
    const tip = t.editor.handles().find((h) => h.kind === 'boom-tip')!;
    const steps = t.state.undoStack.length;
    t.pointerDown(tip.at.x, tip.at.y).expectToBeIn('select.slewing');
    const r = Math.hypot(tip.at.x, tip.at.y);
    for (const a of [100, 120, 150.4]) t.pointerMove(r * Math.cos((a * Math.PI) / 180), r * Math.sin((a * Math.PI) / 180));
    t.pointerUp(r * Math.cos((150.4 * Math.PI) / 180), r * Math.sin((150.4 * Math.PI) / 180));
    expect(t.byKind('truck')[0].boom.slew).toBe(150);
    expect(t.state.undoStack.length).toBe(steps + 1);
  });

  it('arrow keys slew the boom: left is counter-clockwise', () => {
    const t = new TestEditor().tool('truck').click(0, 0);
    const s0 = t.byKind('truck')[0].boom.slew;
    t.keyDown('ArrowLeft').keyDown('ArrowLeft', { shift: true });
    expect(t.byKind('truck')[0].boom.slew).toBe(s0 + 11);
    t.keyDown('ArrowRight');
    expect(t.byKind('truck')[0].boom.slew).toBe(s0 + 10);
  });

  it('drags a pad in along its leg, settling on the retracted stage near it', () => {
    const t = new TestEditor().tool('truck').click(0, 0);
    const pad = t.editor.handles().find((h) => h.kind === 'pad' && h.legId === 'FL')!;
    const leg = t.state.truck!.legs.find((l) => l.id === 'FL')!;
    t.drag([pad.at.x, pad.at.y], [pad.at.x, pad.at.y - 0.7]);
    expect(t.byKind('truck')[0].legs.FL.extension).toBeCloseTo(maxExtension(leg) - 0.7, 6);
    // 0.1 m from the intermediate stage mark (1.6 m out): it settles on the stage.
    t.drag([pad.at.x, pad.at.y - 0.7], [pad.at.x, leg.mount.y + leg.intermediate! + 0.1]);
    expect(t.byKind('truck')[0].legs.FL.extension).toBeCloseTo(leg.intermediate! - leg.retracted, 9);
    t.drag([pad.at.x, leg.mount.y + leg.intermediate!], [pad.at.x, leg.mount.y + leg.retracted + 0.1]);
    expect(t.byKind('truck')[0].legs.FL.extension).toBe(0);
  });
});

describe('multi-select, clipboard', () => {
  it('shift-click adds to the selection and a drag moves all of it', () => {
    const t = withTruckAndShed().tool('pole').click(-20, 20);
    const [shed, pole] = t.byKind('obstacle');
    t.click(shed.x, shed.y).click(pole.x, pole.y, { shift: true });
    expect(t.state.selection.sort()).toEqual([shed.id, pole.id].sort());
    t.drag([pole.x, pole.y], [pole.x, pole.y - 3.048]);
    expect(t.obj(shed.id).y).toBeCloseTo(shed.y - 3.048, 9);
    expect(t.obj(pole.id).y).toBeCloseTo(pole.y - 3.048, 9);
  });

  it('shift-drag on empty ground selects what the box encloses', () => {
    const t = withTruckAndShed().tool('pole').click(-20, 20);
    const [shed] = t.byKind('obstacle');
    t.keyDown('Escape');
    expect(t.state.selection).toEqual([]);
    t.drag([15, 15], [26, 26], { shift: true });
    expect(t.state.selection).toEqual([shed.id]);
  });

  it('copy and paste twice makes two offset copies with new ids; duplicate too; the truck is never copied', () => {
    const t = withTruckAndShed();
    const shed = t.byKind('obstacle')[0];
    t.keyDown('a', { mod: true }).keyDown('c', { mod: true }).keyDown('v', { mod: true }).keyDown('v', { mod: true });
    const sheds = t.byKind('obstacle');
    expect(sheds).toHaveLength(3);
    expect(new Set(sheds.map((s) => s.id)).size).toBe(3);
    expect(sheds[1].x).toBeCloseTo(shed.x + 1, 9);
    expect(sheds[2].x).toBeCloseTo(shed.x + 2, 9);
    expect(t.byKind('truck')).toHaveLength(1);
    t.keyDown('d', { mod: true });
    expect(t.byKind('obstacle')).toHaveLength(4);
    expect(sceneDocumentSchema.safeParse(t.doc).success).toBe(true);
  });

  it('delete removes the selection and undo brings it back', () => {
    const t = withTruckAndShed();
    const shed = t.byKind('obstacle')[0];
    t.click(shed.x, shed.y).keyDown('Delete');
    expect(t.byKind('obstacle')).toHaveLength(0);
    t.keyDown('z', { mod: true });
    expect(t.byKind('obstacle')[0]).toEqual(shed);
  });
});

describe('tape, panning and read-only', () => {
  it('measures with the tape tool and drops a tape that never stretched', () => {
    const t = new TestEditor().tool('tape').expectToBeIn('tape.idle');
    t.drag([0, 0], [3.048, 4.572]).expectToBeIn('tape.idle');
    const [tape] = t.byKind('tape');
    expect(Math.hypot(tape.x2 - tape.x, tape.y2 - tape.y)).toBeCloseTo(Math.hypot(3.048, 4.572), 9);
    t.click(10, 10);
    expect(t.byKind('tape')).toHaveLength(1);
  });

  it('a drag on empty ground pans the view and leaves the document alone', () => {
    const t = new TestEditor();
    const doc = t.doc;
    // 200 px right at 20 px/m moves the view 10 m west.
    t.dragScreen([500, 400], [700, 400]);
    expect(t.state.camera.x).toBeCloseTo(-10, 9);
    expect(t.doc).toBe(doc);
  });

  it('read-only: nothing changes the document, but the slew can still be scrubbed for viewing', () => {
    const t = new TestEditor().tool('truck').click(0, 0);
    t.state.set({ readOnly: true });
    const doc = t.doc;
    t.keyDown('ArrowLeft', { shift: true }).keyDown('Delete').keyDown('a', { mod: true }).keyDown('Delete');
    expect(t.doc).toBe(doc);
    expect(t.state.scrubSlew).toBe(100);
  });
});
