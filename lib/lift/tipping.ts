import { LiftError } from './errors';
import type { PreparedLift } from './prepare';

/**
 * Percent of tipping about each tipping line at one slew. For a line with outward normal n and offset c,
 * the stabilising moment of every mass except the hook load is Σ m·(c − n·r) = M·c − n·(Σ m r), which
 * needs only the total mass and first moments; the hook load's lever arm outside the line is n·h − c.
 * Tipping load = stabilising moment ÷ lever arm; percent = hook load ÷ tipping load × 100. This follows
 * the tipping definition behind the 85 % rating on outriggers (ASME B30.5 with SAE J765 test conditions).
 */
export interface TippingHit {
  /** Percent of tipping on the governing line. */
  percent: number;
  /** Index into prepared.lines of the governing line. */
  line: number;
  /** Index of a line the truck tips about with no load at all, or −1. */
  unloaded: number;
}

const scratch: TippingHit = { percent: 0, line: 0, unloaded: -1 };

/**
 * Evaluates every line at slew `deg`; fills `perLine` when given. Returns a shared object that is
 * overwritten on the next call (the sweep calls this thousands of times).
 */
export function tippingAt(p: PreparedLift, deg: number, perLine?: Float64Array): TippingHit {
  const a = (deg * Math.PI) / 180;
  return tippingAtCS(p, Math.cos(a), Math.sin(a), perLine);
}

/** tippingAt with the slew given as its cosine and sine (the sweep steps them by rotation). */
export function tippingAtCS(p: PreparedLift, c: number, s: number, perLine?: Float64Array): TippingHit {
  const mass = p.fixedMass + p.rotMass;
  const mx = p.fixedMx + c * p.rotMx0 - s * p.rotMy0;
  const my = p.fixedMy + s * p.rotMx0 + c * p.rotMy0;
  const hx = c * p.hookX0 - s * p.hookY0;
  const hy = s * p.hookX0 + c * p.hookY0;
  let best = -1;
  let bestLever = -Infinity;
  let bestLine = 0;
  let unloaded = -1;
  const lines = p.lines;
  for (let i = 0; i < lines.length; i++) {
    const l = lines[i];
    const stab = mass * l.c - (l.nx * mx + l.ny * my);
    const lever = l.nx * hx + l.ny * hy - l.c;
    if (stab <= 1e-9 * mass) unloaded = i;
    const pct = stab > 0 && lever > 0 ? (100 * p.hookLoad * lever) / stab : 0;
    if (perLine) perLine[i] = pct;
    if (pct > best || (pct === best && lever > bestLever)) {
      best = pct;
      bestLever = lever;
      bestLine = i;
    }
  }
  scratch.percent = best;
  scratch.line = bestLine;
  scratch.unloaded = unloaded;
  return scratch;
}

/**
 * The stabilising moment about each line is A + B·cos θ + C·sin θ, so its smallest value on the arc is
 * found exactly: at the ends, or at θ* = atan2(−C, −B) when that lies inside. Throws tips-unloaded
 * when it reaches zero anywhere on the planned swing.
 */
export function assertStandsUnloaded(p: PreparedLift): void {
  const mass = p.fixedMass + p.rotMass;
  for (const l of p.lines) {
    const A = mass * l.c - (l.nx * p.fixedMx + l.ny * p.fixedMy);
    const B = -(l.nx * p.rotMx0 + l.ny * p.rotMy0);
    const C = -(-l.nx * p.rotMy0 + l.ny * p.rotMx0);
    const at = (deg: number) => A + B * Math.cos((deg * Math.PI) / 180) + C * Math.sin((deg * Math.PI) / 180);
    const candidates = [p.from, p.from + p.sign * p.span];
    const star = (Math.atan2(-C, -B) * 180) / Math.PI;
    const rel = (((p.sign * (star - p.from)) % 360) + 360) % 360;
    if (rel <= p.span) candidates.push(p.from + p.sign * rel);
    for (const deg of candidates) {
      if (at(deg) <= 1e-9 * mass) {
        const shown = (((deg % 360) + 360) % 360).toFixed(1);
        throw new LiftError(
          'tips-unloaded',
          `With nothing on the hook the truck would tip about line ${l.id} at slew ${shown}°: move the counterweight or the supports.`,
          'masses',
        );
      }
    }
  }
}
