import { describe, expect, it } from 'vitest';
import { analyzeLift, LiftError, type LiftErrorCode, type LiftInputIn } from '@/lib/lift';
import { squareOfPads } from './scenarios';

function codeOf(input: unknown): LiftErrorCode | 'none' {
  try {
    analyzeLift(input as LiftInputIn);
    return 'none';
  } catch (e) {
    if (e instanceof LiftError) {
      expect(e.message.length).toBeGreaterThan(10);
      return e.code;
    }
    throw e;
  }
}

// Source for every case: issue 3, "Errors" — each gives a typed error with a plain message, never a silent pass.
describe('typed engine errors', () => {
  const base = squareOfPads();
  it('too-few-supports', () => {
    expect(codeOf({ ...base, supports: base.supports.slice(0, 2) })).toBe('too-few-supports');
  });
  it('collinear-supports', () => {
    const line = [0, 1, 2].map((i) => ({ id: `P${i}`, x: i, y: 2 * i, area: 0.2 }));
    expect(codeOf({ ...base, supports: line })).toBe('collinear-supports');
  });
  it('coincident-supports: two pads on one spot, naming the second', () => {
    const twin = [...base.supports, { ...base.supports[0], id: 'FL2', x: base.supports[0].x + 0.004 }];
    expect(codeOf({ ...base, supports: twin })).toBe('coincident-supports');
    try {
      analyzeLift({ ...base, supports: twin });
    } catch (e) {
      expect((e as LiftError).field).toBe(`supports.${twin.length - 1}`);
    }
    expect(codeOf({ ...base, supports: [...base.supports, { ...base.supports[0], id: 'FL2', x: base.supports[0].x + 0.02 }] })).toBe('none');
  });
  it('invalid-mass: negative, and NaN given to the library', () => {
    expect(codeOf({ ...base, masses: [{ id: 'carrier', mass: -5, x: 0, y: 0, z: 1 }] })).toBe('invalid-mass');
    expect(codeOf({ ...base, load: { ...base.load, mass: Number.NaN } })).toBe('invalid-mass');
    expect(codeOf({ ...base, hook: { blockMass: -1, riggingMass: 0 } })).toBe('invalid-mass');
  });
  it('zero-length-boom', () => {
    expect(codeOf({ ...base, boom: { ...base.boom, length: 0 } })).toBe('zero-length-boom');
  });
  it('degenerate-polygon, naming the field', () => {
    const flat = { id: 'kerb', polygon: [{ x: 5, y: 0 }, { x: 6, y: 0 }, { x: 7, y: 0 }], top: 0.2 };
    expect(codeOf({ ...base, obstacles: [flat] })).toBe('degenerate-polygon');
    try {
      analyzeLift({ ...base, obstacles: [flat] });
    } catch (e) {
      expect((e as LiftError).field).toBe('obstacles.0.polygon');
    }
  });
  it('tips-unloaded: a counterweight far over the rear tips the truck with nothing on the hook', () => {
    const heavy = { ...base, masses: [...base.masses, { id: 'counterweight', mass: 30000, x: -5, y: 0, z: 2, rotates: true }] };
    expect(codeOf(heavy)).toBe('tips-unloaded');
    // Only part of the arc puts it over a side: the exact minimum is still found between samples.
    expect(codeOf({ ...heavy, swing: { from: 170, to: 190, direction: 'ccw' } })).toBe('tips-unloaded');
  });
  it('invalid-rigging and invalid-input', () => {
    expect(codeOf({ ...base, rigging: { shackles: [{ id: 'x', size: '9/16' }] } })).toBe('invalid-rigging');
    expect(codeOf({ ...base, swing: { from: 'north', to: 10, direction: 'ccw' } })).toBe('invalid-input');
  });
  it('messages name things as people do, never by an internal id (they reach the editor and the plan as they are)', () => {
    const messageOf = (input: unknown) => {
      try {
        analyzeLift(input as LiftInputIn);
      } catch (e) {
        return (e as LiftError).message;
      }
      return '';
    };
    const sliver = [{ x: 5, y: 0 }, { x: 6, y: 0 }, { x: 7, y: 0 }];
    const named = messageOf({ ...base, obstacles: [{ id: 'obstacle-6c1am4', name: 'Light pole', polygon: sliver, top: 6 }] });
    expect(named).toMatch(/^The obstacle “Light pole” has no area/);
    const unnamed = messageOf({ ...base, obstacles: [{ id: 'obstacle-6c1am4', polygon: sliver, top: 6 }] });
    expect(unnamed).toMatch(/^An obstacle has no area/);
    const twin = messageOf({ ...base, supports: [...base.supports, { ...base.supports[0], id: 'FL2', x: base.supports[0].x + 0.004 }] });
    expect(twin).toMatch(/^The left front and left front FL2 pads stand at the same spot \(within a hair's breadth\)/);
    // No id-like token: quoted codes, slug-with-suffix object ids, or check ids with colons.
    for (const m of [named, unnamed, twin]) expect(m).not.toMatch(/"[A-Za-z0-9-]+"|[a-z]+-[a-z0-9]{6}\b|\b[a-z]+:[A-Za-z0-9:-]+/);
  });
  it('a well-formed input passes', () => {
    expect(codeOf(base)).toBe('none');
  });
});
