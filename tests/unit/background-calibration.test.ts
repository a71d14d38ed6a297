import { describe, expect, it } from 'vitest';
import { applyCalibration, CalibrationError, metresPerPixel, parseDistance, placeNewBackground } from '@/canvas/background/calibration';

// Exact unit factors from lib/units.ts (1 ft = 0.3048 m, 1 in = 0.0254 m; NIST SP 811).
describe('background calibration', () => {
  it('scale is the known distance over the pixel distance (3-4-5 triangle: 500 px)', () => {
    expect(metresPerPixel({ x: 100, y: 100 }, { x: 400, y: 500 }, 25)).toBeCloseTo(0.05, 12);
  });

  it('refuses points too close together and a zero distance, naming which input is wrong', () => {
    expect(() => metresPerPixel({ x: 0, y: 0 }, { x: 3, y: 4 }, 10)).toThrow(CalibrationError);
    try {
      metresPerPixel({ x: 0, y: 0 }, { x: 300, y: 400 }, 0);
    } catch (e) {
      expect((e as CalibrationError).field).toBe('distance');
    }
    expect.assertions(2);
  });

  it('reads feet-inches for imperial users and metres for metric users', () => {
    expect(parseDistance(`41' 6"`, 'imperial')).toBeCloseTo(41 * 0.3048 + 6 * 0.0254, 12);
    expect(parseDistance('100', 'imperial')).toBeCloseTo(30.48, 12);
    expect(parseDistance('12.65 m', 'metric')).toBe(12.65);
    expect(parseDistance('12,5', 'metric')).toBe(12.5);
    expect(parseDistance('abc', 'metric')).toBeNull();
    expect(parseDistance('0', 'imperial')).toBeNull();
  });

  it('keeps the image centre fixed on the site when the scale changes', () => {
    const size = { width: 1000, height: 600 };
    const bg = placeNewBackground('7', size, { x: 10, y: -4 }, 60);
    expect(bg.metresPerPixel).toBeCloseTo(0.06, 12);
    const next = applyCalibration(bg, size, { x: 0, y: 0 }, { x: 600, y: 800 }, 30); // 1000 px = 30 m
    expect(next.metresPerPixel).toBeCloseTo(0.03, 12);
    expect(next.x + 500 * next.metresPerPixel).toBeCloseTo(10, 9);
    expect(next.y - 300 * next.metresPerPixel).toBeCloseTo(-4, 9);
    expect(next.calibration).toEqual({ a: { x: 0, y: 0 }, b: { x: 600, y: 800 }, distance: 30 });
  });
});
