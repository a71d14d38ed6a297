import type { UnitSystem } from '@/lib/units';
import { parseLength } from '@/lib/format/parse';

export interface ImagePoint {
  /** Image pixels from the top-left corner, x right, y down. */
  x: number;
  y: number;
}

/** The background fields of the scene document (lib/scene backgroundSchema). */
export interface BackgroundPlacement {
  uploadId: string;
  /** Site position of the image's top-left corner, m (x east, y north). */
  x: number;
  y: number;
  metresPerPixel: number;
  rotation: number;
  opacity: number;
  locked: boolean;
  calibration: { a: ImagePoint; b: ImagePoint; distance: number } | null;
}

/** Two clicks closer than this (image pixels) are too close to give a trustworthy scale. */
export const MIN_CALIBRATION_PIXELS = 10;

export class CalibrationError extends Error {
  constructor(
    readonly field: 'points' | 'distance',
    message: string,
  ) {
    super(message);
  }
}

/** Metres per image pixel from two image points a known site distance apart. */
export function metresPerPixel(a: ImagePoint, b: ImagePoint, distanceM: number): number {
  const px = Math.hypot(b.x - a.x, b.y - a.y);
  if (!(px >= MIN_CALIBRATION_PIXELS)) throw new CalibrationError('points', `Pick two points at least ${MIN_CALIBRATION_PIXELS} pixels apart`);
  if (!(distanceM > 0) || !Number.isFinite(distanceM)) throw new CalibrationError('distance', 'The known distance must be more than zero');
  return distanceM / px;
}

/**
 * A typed distance in the user's units: feet-inches (41' 6", 41.5, 498") for imperial, metres
 * (12.65 or 12.65 m) for metric. Null when unreadable or not positive.
 */
export function parseDistance(text: string, units: UnitSystem): number | null {
  const v = parseLength(text, units);
  return v !== null && v > 0 ? v : null;
}

/**
 * Applies a calibration, keeping the site point under the image centre where it was, so the image grows
 * or shrinks in place instead of sliding away from the sketch.
 */
export function applyCalibration(bg: BackgroundPlacement, size: { width: number; height: number }, a: ImagePoint, b: ImagePoint, distanceM: number): BackgroundPlacement {
  const next = metresPerPixel(a, b, distanceM);
  const cx = bg.x + (size.width / 2) * bg.metresPerPixel;
  const cy = bg.y - (size.height / 2) * bg.metresPerPixel;
  return { ...bg, metresPerPixel: next, x: cx - (size.width / 2) * next, y: cy + (size.height / 2) * next, calibration: { a, b, distance: distanceM } };
}

/**
 * A freshly uploaded image, centred on a site point, at a provisional scale that makes its longer side
 * `spanM` metres until the user calibrates it.
 */
export function placeNewBackground(uploadId: string, size: { width: number; height: number }, centre: { x: number; y: number }, spanM = 60): BackgroundPlacement {
  const mpp = spanM / Math.max(size.width, size.height, 1);
  return {
    uploadId,
    x: centre.x - (size.width / 2) * mpp,
    y: centre.y + (size.height / 2) * mpp,
    metresPerPixel: mpp,
    rotation: 0,
    opacity: 0.6,
    locked: false,
    calibration: null,
  };
}
