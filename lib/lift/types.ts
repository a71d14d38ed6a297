/**
 * Branded number and point types for the lift engine. They cost nothing at run time; they stop a
 * degree going where a radian is wanted, or a site-frame point being used as a truck-frame one.
 * Plain numbers come in through the zod schema; the engine brands them at the boundary.
 */
import { wrap360 } from '@/lib/angles';

declare const brand: unique symbol;
export type Brand<T, B extends string> = T & { readonly [brand]: B };

/** Angle in degrees, counter-clockwise seen from above (slew 0 = boom along truck +x). */
export type Degrees = Brand<number, 'Degrees'>;
export type Radians = Brand<number, 'Radians'>;
/** Mass in kilograms. */
export type Kg = Brand<number, 'Kg'>;
/** Force in kilonewtons (mass × g / 1000). */
export type KN = Brand<number, 'KN'>;
/** Pressure in kilopascals. */
export type KPa = Brand<number, 'KPa'>;
/** Length in metres. */
export type Metres = Brand<number, 'Metres'>;
/** A percentage, 0–100 (may exceed 100). */
export type Percent = Brand<number, 'Percent'>;

/** Truck frame: origin on the ground at the slew axis, x forward to the cab, y left, z up (m). */
export type TruckPoint = { readonly x: number; readonly y: number } & { readonly [brand]: 'TruckPoint' };
/** Site frame: the scene's own plan coordinates (m); the truck stands somewhere in it. */
export type SitePoint = { readonly x: number; readonly y: number } & { readonly [brand]: 'SitePoint' };
export type TruckPoint3 = { readonly x: number; readonly y: number; readonly z: number } & { readonly [brand]: 'TruckPoint3' };

export const deg = (n: number) => n as Degrees;
export const rad = (n: number) => n as Radians;
export const kg = (n: number) => n as Kg;
export const metres = (n: number) => n as Metres;
export const percent = (n: number) => n as Percent;
export const truckPoint = (x: number, y: number) => ({ x, y }) as TruckPoint;
export const sitePoint = (x: number, y: number) => ({ x, y }) as SitePoint;
export const truckPoint3 = (x: number, y: number, z: number) => ({ x, y, z }) as TruckPoint3;

export const toRadians = (d: Degrees): Radians => ((d * Math.PI) / 180) as Radians;
export const toDegrees = (r: Radians): Degrees => ((r * 180) / Math.PI) as Degrees;

/** Normalises to [0, 360) (lib/angles.ts). */
export const normalizeDegrees = (d: number) => wrap360(d) as Degrees;

/** Where the truck stands in the site frame: position of its slew axis and heading of its +x (deg, CCW). */
export interface SitePose {
  x: number;
  y: number;
  heading: number;
}

/** Site frame → truck frame: translate to the slew axis, then turn by −heading. */
export function siteToTruck(p: { x: number; y: number }, pose: SitePose): TruckPoint {
  const h = toRadians(deg(pose.heading));
  const dx = p.x - pose.x;
  const dy = p.y - pose.y;
  const c = Math.cos(h);
  const s = Math.sin(h);
  return truckPoint(c * dx + s * dy, -s * dx + c * dy);
}

/** Truck frame → site frame (the inverse of siteToTruck). */
export function truckToSite(p: { x: number; y: number }, pose: SitePose): SitePoint {
  const h = toRadians(deg(pose.heading));
  const c = Math.cos(h);
  const s = Math.sin(h);
  return sitePoint(pose.x + c * p.x - s * p.y, pose.y + s * p.x + c * p.y);
}
