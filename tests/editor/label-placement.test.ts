import { describe, expect, it } from 'vitest';
import { overlapArea, placeLabels, type LabelRequest } from '@/canvas/overlays/label-placement';

const view = { width: 800, height: 600 };
const req = (key: string, x: number, y: number, w: number, priority: number): LabelRequest => ({ key, anchor: { x, y }, w, h: 20, priority });

function noOverlaps(boxes: { x: number; y: number; w: number; h: number }[]) {
  for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(overlapArea(boxes[i], boxes[j]), `boxes ${i} and ${j}`).toBe(0);
}

describe('plan label placement', () => {
  it('overlap area is the intersection of two rectangles', () => {
    // Source: rectangle intersection, width × height of the common interval [derived].
    expect(overlapArea({ x: 0, y: 0, w: 10, h: 10 }, { x: 5, y: 6, w: 10, h: 10 })).toBe(5 * 4);
    expect(overlapArea({ x: 0, y: 0, w: 10, h: 10 }, { x: 10, y: 0, w: 5, h: 5 })).toBe(0);
  });

  it('ten labels on one anchor all fit without covering one another, inside the view', () => {
    const rs = Array.from({ length: 10 }, (_, i) => req(`l${i}`, 400, 300, 120 + 7 * i, i));
    const { placed } = placeLabels(rs, view);
    expect(placed).toHaveLength(10);
    noOverlaps(placed.map((p) => p.box));
    for (const p of placed) {
      expect(p.box.x).toBeGreaterThanOrEqual(0);
      expect(p.box.y).toBeGreaterThanOrEqual(0);
      expect(p.box.x + p.box.w).toBeLessThanOrEqual(view.width);
      expect(p.box.y + p.box.h).toBeLessThanOrEqual(view.height);
    }
    // Those pushed past the first ring point back at the anchor.
    expect(placed.filter((p) => p.leader).length).toBeGreaterThan(0);
  });

  it('the most important label takes the first spot, right and below the anchor', () => {
    const { placed } = placeLabels([req('minor', 100, 100, 80, 5), req('over', 100, 100, 80, 0)], view);
    const over = placed.find((p) => p.key === 'over')!;
    expect(over.box).toEqual({ x: 106, y: 106, w: 80, h: 20 });
    expect(over.leader).toBeNull();
    const minor = placed.find((p) => p.key === 'minor')!;
    expect(overlapArea(minor.box, over.box)).toBe(0);
  });

  it('a note a user placed stays put and others keep off it', () => {
    const note = { key: 'note', anchor: { x: 106, y: 106 }, w: 200, h: 60, priority: 0, fixed: { x: 106, y: 106, w: 200, h: 60 } };
    const { placed } = placeLabels([note, req('clear', 100, 100, 90, 0)], view);
    expect(placed.find((p) => p.key === 'note')!.box).toEqual(note.fixed);
    expect(overlapArea(placed.find((p) => p.key === 'clear')!.box, note.fixed)).toBe(0);
  });

  it('keeps last frame’s spot while it is still free, so labels do not hop during a scrub', () => {
    const first = placeLabels([req('a', 300, 300, 100, 0)], view, new Map([['a', 3]]));
    expect(first.choice.get('a')).toBe(3);
    // Direction 3 is left-above: the box ends GAP left of and above the anchor.
    expect(first.placed[0].box).toEqual({ x: 300 - 100 - 6, y: 300 - 20 - 6, w: 100, h: 20 });
  });

  it('a label whose anchor is off the edge is pulled into view', () => {
    const { placed } = placeLabels([req('edge', 790, 590, 150, 0)], view);
    const b = placed[0].box;
    expect(b.x + b.w).toBeLessThanOrEqual(view.width);
    expect(b.y + b.h).toBeLessThanOrEqual(view.height);
    expect(b.x).toBeLessThan(790);
  });
});
