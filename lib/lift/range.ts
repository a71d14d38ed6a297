/**
 * Physical ranges of every number (issue 9). A value outside its range (or not finite: zod refuses NaN and
 * ±Infinity) is a typed error naming the field: 400 at the route, LiftError in the library. The ranges are
 * far beyond any truck, load or site (common practice, no published source), and small enough that no
 * product of them overflows a double, so no result can come out NaN or infinite.
 */
export const RANGE = {
  /** kg, any one mass: 10 000 t. */
  mass: 1e7,
  /** m from the slew axis: the truck's own supports, masses, boom pivot. */
  truck: 100,
  /** m: positions of obstacles, power lines, body outlines and the truck on its site (100 km). */
  site: 1e5,
  /** m: heights of tops, wires and the pivot. */
  height: 1000,
  /** m: the boom, the load's size. */
  length: 200,
  /** m²: a pad or a mat, from 1 cm². */
  areaMin: 1e-4,
  areaMax: 100,
  /** degrees: swing ends and headings, ±10 turns. */
  angle: 3600,
  /** kPa: allowable ground pressure. */
  pressureMin: 1,
  pressureMax: 1e5,
} as const;
