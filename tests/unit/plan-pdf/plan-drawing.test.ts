import { describe, expect, it } from 'vitest';
import { DEMO_SCENES } from '@/db/seed/demo-scenes';
import { HR7_SPEC } from '@/db/seed/demo-trucks';
import { analyzeLift } from '@/lib/lift';
import { sceneDocumentSchema } from '@/lib/scene/schema';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import { drawingAnalysis } from '@/canvas/export/revision-analysis';
import { planDrawing } from '@/canvas/export/plan-drawing';
import { CAUTION_STRIP_PT, planSvg } from '@/canvas/export/plan-svg';
import { CAUTION_LINES } from '@/lib/caution';
import { chooseScale, clipPolygon, PT_PER_M_AT_1_TO_1 } from '@/canvas/export/paper';

const coil = { document: sceneDocumentSchema.parse(DEMO_SCENES.find((s) => s.title.startsWith('Coil transfer'))!.document) };
const model = truckModelFromProfile({ id: 1, version: 1, name: '50-ton rotator (example values)', unitNumber: 'HR-7', spec: HR7_SPEC });

function drawing(units: 'imperial' | 'metric') {
  const lift = sceneToLiftInput(coil.document, model);
  if (!lift.ok) throw new Error(lift.problem.message);
  const result = analyzeLift(lift.input);
  return { result, d: planDrawing({ doc: coil.document, model, analysis: drawingAnalysis(coil.document, model, result)!, names: lift.names, units, width: 540, height: 540 })! };
}

describe('plan drawing export', { timeout: 60_000 }, () => {
  it('states a ratio scale that maps metres to paper exactly (1 in = 72 pt)', () => {
    // 30 m across 540 pt needs at least 1:157; the imperial series offers 1:240 (1 in = 20 ft).
    const s = chooseScale(30, 10, 540, 540, 'imperial');
    expect(s.ratio).toBe(240);
    expect(s.label).toBe('1:240 (1 in = 20 ft)');
    // 20 ft of site is 1 inch (72 pt) of paper at 1:240.
    expect(s.ptPerM * 20 * 0.3048).toBeCloseTo(72, 9);
    expect(chooseScale(30, 10, 540, 540, 'metric').label).toBe('1:200 (1 cm = 2 m)');
    expect(PT_PER_M_AT_1_TO_1).toBeCloseTo(72 / 0.0254, 9);
  });

  it('clips polygons to the paper', () => {
    const clipped = clipPolygon([{ x: -10, y: -10 }, { x: 50, y: -10 }, { x: 50, y: 50 }, { x: -10, y: 50 }], 20, 20);
    expect(clipped.every((p) => p.x >= 0 && p.x <= 20 && p.y >= 0 && p.y <= 20)).toBe(true);
    expect(clipped.length).toBe(4);
  });

  it('draws the sketch with the worst case, governing line, pads, scale and north arrow, all on the paper', () => {
    const { d, result } = drawing('imperial');
    const texts = d.items.filter((i) => i.t === 'text').map((i) => (i.t === 'text' ? i.text : ''));
    expect(texts).toContain(`Scale ${d.scaleLabel}`);
    expect(texts).toContain('N');
    expect(texts).toContain(`Worst case: ${result.worstCase.percentOfTipping.toFixed(1)} % at slew ${result.worstCase.slew.toFixed(0)}°`);
    // By its side with the short code second (the pads' codes are explained in the key under the drawing).
    expect(texts.some((t) => /^Governing tipping line: [a-z ]+ \(/.test(t) && t.endsWith(`(${result.worstCase.line})`))).toBe(true);
    for (const pad of ['FL', 'FR', 'RL', 'RR', 'FJ']) expect(texts).toContain(pad);
    expect(texts.some((t) => t.startsWith('Feeder 13.8 kV: keep 10′ 0″ (3.05 m) away'))).toBe(true);
    for (const i of d.items) {
      const pts = i.t === 'poly' ? i.pts : [{ x: i.x, y: i.y }];
      for (const p of pts) {
        expect(p.x).toBeGreaterThanOrEqual(0);
        expect(p.x).toBeLessThanOrEqual(540);
        expect(p.y).toBeGreaterThanOrEqual(0);
        expect(p.y).toBeLessThanOrEqual(540);
      }
    }
  });

  it('writes a standalone SVG sized in points, the caution and the pad key in a strip under the drawing', () => {
    const { d } = drawing('metric');
    const svg = planSvg(d, 'Coil <transfer>');
    expect(svg.startsWith(`<svg xmlns="http://www.w3.org/2000/svg" width="540pt" height="${540 + CAUTION_STRIP_PT}pt"`)).toBe(true);
    for (const line of CAUTION_LINES) expect(svg).toContain(line);
    expect(svg).toMatch(/Pads: FL left front · FR right front/);
    expect(svg).not.toMatch(/Governing tipping line [A-Z]+-[A-Z]+</);
    expect(svg).toContain('<title>Coil &lt;transfer&gt;: plan drawing, scale 1:');
    expect((svg.match(/<polygon /g) ?? []).length).toBeGreaterThan(20);
    expect(svg).toContain('(1 cm = ');
  });
});
