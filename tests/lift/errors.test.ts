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
  it('a well-formed input passes', () => {
    expect(codeOf(base)).toBe('none');
  });
});
