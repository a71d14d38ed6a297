import { describe, expect, it, vi } from 'vitest';
import { TestEditor } from './test-editor';
import { attachLiveAnalysis } from '@/canvas/analysis/live-analysis';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import { analyzeLift, analyzeAtSlew, liftInputSchema, prepareLift } from '@/lib/lift';
import { HR7_SPEC } from '@/db/seed/demo-trucks';
import { setSlew } from '@/canvas/commands/truck';
import { overlayGeometry } from '@/canvas/analysis/overlay-geometry';
import { analysisPillItems } from '@/canvas/overlays/analysis-labels';
import { formatLength } from '@/lib/format/quantity';

const HR7 = { id: 1, version: 1, name: 'Unit 7 — 50-ton rotator (example values)', unitNumber: 'HR-7', spec: HR7_SPEC };

function coilScene() {
  const t = new TestEditor({ profiles: [HR7] });
  attachLiveAnalysis(t.store);
  t.tool('truck').click(0, 0).tool('load-coil').click(0, -6.1, { alt: true }).tool('obstacle-rect').click(9.144, 9.144);
  return t;
}

describe('live analysis', () => {
  it('waits for a truck and a load, saying what is missing', () => {
    const t = new TestEditor({ profiles: [HR7] });
    attachLiveAnalysis(t.store);
    expect(t.state.analysis?.lift.ok).toBe(false);
    t.tool('truck').click(0, 0);
    const a = t.state.analysis!;
    expect(a.lift.ok === false && a.lift.problem.message).toMatch(/Place the load/);
  });

  it('the full result is analyzeLift on the scene, and scrubbing gives analyzeAtSlew at that slew', () => {
    const t = coilScene();
    const a = t.state.analysis!;
    expect(a.result).not.toBeNull();
    const lift = sceneToLiftInput(t.doc, t.state.truck);
    if (!lift.ok) throw new Error('expected an analysable scene');
    expect(a.result!.worstCase).toEqual(analyzeLift(lift.input).worstCase);
    const before = a.result;
    t.state.run(setSlew(137, 'gesture'));
    expect(t.state.analysis!.result).toBe(before);
    expect(t.state.analysis!.snapshot!.governing).toEqual(analyzeAtSlew(prepareLift(lift.input), 137).governing);
  });

  it('site objects reach the engine in the truck frame: turning the whole scene 90° about the axis leaves every clearance as it was', () => {
    // Turning the truck, load and shed together about the slew axis must not change any clearance: the
    // engine sees the same truck-frame picture. A wrong site→truck transform would move the shed.
    const t = coilScene();
    const c0 = t.state.analysis!.result!.clearances.map((c) => c.horizontal);
    const shed = t.byKind('obstacle')[0];
    const ids = t.doc.objects.map((o) => o.id);
    t.state.run((doc) => {
      const c = Math.cos(Math.PI / 2), s = Math.sin(Math.PI / 2);
      return {
        capture: 'commit',
        document: { ...doc, objects: doc.objects.map((o) => (ids.includes(o.id) ? { ...o, x: c * o.x - s * o.y, y: s * o.x + c * o.y, rotation: o.rotation + 90 } : o)) },
      };
    });
    expect(t.obj(shed.id).x).toBeCloseTo(-shed.y, 9);
    const c1 = t.state.analysis!.result!.clearances.map((c) => c.horizontal);
    c1.forEach((v, i) => expect(v).toBeCloseTo(c0[i], 6));
  });

  it('moving the shed 3.048 m nearer the swing shrinks its clearance by the same amount', () => {
    // The shed faces the swing along y; the hook swings at a fixed radius, so a shift along the line
    // through the nearest point changes the gap one for one (until something else becomes nearest).
    const t = new TestEditor({ profiles: [HR7] });
    attachLiveAnalysis(t.store);
    t.tool('truck').click(0, 0).tool('load-coil').click(6.1, 0, { alt: true });
    t.state.run((doc) => ({ capture: 'commit', document: { ...doc, swing: { from: 0, to: 10, direction: 'ccw' } } }));
    t.tool('obstacle-rect').click(20, 0, { alt: true });
    const shed = t.byKind('obstacle')[0];
    const gap = () => t.state.analysis!.result!.clearances.find((c) => c.target === shed.id)!.horizontal;
    const g0 = gap();
    t.drag([shed.x, shed.y], [shed.x - 3.048, shed.y], { alt: true });
    expect(gap()).toBeCloseTo(g0 - 3.048, 3);
  });

  it('a drag does no full parse of the engine input per frame (issue 10 item 5), and ends on the full result', () => {
    const t = coilScene();
    const shed = t.byKind('obstacle')[0];
    const full = vi.spyOn(liftInputSchema, 'safeParse');
    t.drag([shed.x, shed.y], [shed.x + 2, shed.y], { alt: true }, 40);
    expect(full).not.toHaveBeenCalled();
    full.mockRestore();
    const lift = sceneToLiftInput(t.doc, t.state.truck);
    if (!lift.ok) throw new Error('expected an analysable scene');
    expect(t.state.analysis!.result!.worstCase).toEqual(analyzeLift(lift.input).worstCase);
  });

  it('overlays while scrubbing: the swing geometry is kept, the tipping lines carry the snapshot’s figures', () => {
    // Source: definition — the arc, band and clearance marks depend on the plan, not on the slew on screen;
    // each line's percent is the snapshot's at that slew (analyzeAtSlew) [derived].
    const t = coilScene();
    const g0 = overlayGeometry(t.state.analysis, t.doc, t.state.truck)!;
    t.state.run(setSlew(137, 'gesture'));
    const a = t.state.analysis!;
    const g1 = overlayGeometry(a, t.doc, t.state.truck)!;
    expect(g1.arc).toBe(g0.arc);
    expect(g1.clearances).toBe(g0.clearances);
    expect(g1.lines.map((l) => l.percent)).toEqual(a.snapshot!.lines.map((l) => l.percentOfTipping));
    expect(g1.lines.find((l) => l.governing)?.id).toBe(a.snapshot!.governing!.line);
    // Same analysis object: the same answer, not a new one.
    expect(overlayGeometry(a, t.doc, t.state.truck)).toBe(g1);
    // A real edit (the load moves) makes new swing geometry.
    const load = t.byKind('load')[0];
    t.state.run((doc) => ({ capture: 'commit', document: { ...doc, objects: doc.objects.map((o) => (o.id === load.id ? { ...o, x: o.x + 1 } : o)) } }));
    expect(overlayGeometry(t.state.analysis, t.doc, t.state.truck)!.arc).not.toBe(g0.arc);
  });

  it('the boom\u2019s nearest clearance is drawn on the plan: its point on the boom, the gap to the part, the engine\u2019s figure in the user\u2019s units (issue 9)', () => {
    // A tall shed beside the swing: the boom comes nearest it. The mark must carry the engine's own boom
    // clearance (lib/lift/boom-clearance.ts), its point must lie on the boom's plan line at that slew, and
    // the pill must print it in the editor's units [derived].
    const t = coilScene();
    const shed = t.byKind('obstacle')[0];
    t.state.run((doc) => ({ capture: 'commit', document: { ...doc, objects: doc.objects.map((o) => (o.id === shed.id ? { ...o, height: 12 } : o)) } }));
    const res = t.state.analysis!.result!;
    const engine = [...res.boomClearances].sort((a, b) => a.distance - b.distance)[0];
    const g = overlayGeometry(t.state.analysis, t.doc, t.state.truck)!;
    const mark = g.boomClearances.find((c) => c.kind !== 'power-line' && c.target === engine.target)!;
    expect(mark).toBeDefined();
    expect(mark.value).toBe(engine.distance);
    expect(mark.slew).toBe(engine.slew);
    // p on the segment boom[0]–boom[1] (cross product ~0, between the ends).
    const [a, b] = mark.boom;
    const cross = (b.x - a.x) * (mark.p.y - a.y) - (b.y - a.y) * (mark.p.x - a.x);
    expect(Math.abs(cross)).toBeLessThan(1e-6);
    const dot = (mark.p.x - a.x) * (b.x - a.x) + (mark.p.y - a.y) * (b.y - a.y);
    expect(dot).toBeGreaterThanOrEqual(-1e-9);
    expect(dot).toBeLessThanOrEqual((b.x - a.x) ** 2 + (b.y - a.y) ** 2 + 1e-9);
    for (const units of ['imperial', 'metric'] as const) {
      const pill = analysisPillItems(g, (q) => q, units).find((it) => it.key === `boom-${mark.kind}-${mark.target}`)!;
      expect(pill.text).toContain(`Boom to ${mark.name}: ${formatLength(engine.distance, units)}`);
    }
  });
});
