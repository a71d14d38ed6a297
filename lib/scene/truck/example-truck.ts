import type { TruckModel } from './truck-model';

/**
 * A generic rotator outline (invented example values) used only when a profile carries no geometry,
 * so a scene can still be sketched. The editor says so on the canvas.
 */
export function exampleTruckModel(profileId: number, profileVersion: number, name: string, unitNumber: string | null): TruckModel {
  const w = 1.3;
  const rect = (x0: number, x1: number) => [
    { x: x0, y: -w },
    { x: x1, y: -w },
    { x: x1, y: w },
    { x: x0, y: w },
  ];
  const leg = (id: string, x: number, side: 1 | -1) => ({
    id,
    mount: { x, y: side * w },
    direction: side * 90,
    retracted: 0.35,
    intermediate: 1.6,
    full: 2.9,
    pad: { length: 0.6, width: 0.6 },
    padRatingKg: 30000,
  });
  return {
    profileId,
    profileVersion,
    name,
    unitNumber,
    parts: [
      { id: 'cab', kind: 'cab', polygon: rect(3.4, 5.6), top: 3.3 },
      { id: 'body', kind: 'body', polygon: rect(-3.6, 3.4), top: 1.7 },
      { id: 'tailboard', kind: 'tailboard', polygon: rect(-4.8, -3.6), top: 1.2 },
    ],
    legs: [leg('FL', 2.9, 1), leg('FR', 2.9, -1), leg('RL', -3.3, 1), leg('RR', -3.3, -1)],
    boom: { pivot: { x: -0.9, y: 0, z: 3.0 }, minLength: 7.6, maxLength: 15.2, minElevation: -5, maxElevation: 75 },
    exampleOutline: true,
    spec: null,
  };
}
