/**
 * The replay's playback clock: pure state and transitions, no timers. The page feeds it the time between
 * animation frames; tests feed it numbers. Position is `travel`, degrees turned from the pick along the
 * planned arc (0 … span), so the same clock plays a clockwise or a counter-clockwise swing.
 */

export const MIN_SPEED = 0.25;
export const MAX_SPEED = 4;
/** The speeds the controls offer; keys 1–4 choose the ones from 0.5× up (0.25× is on the control only). */
export const SPEEDS = [0.25, 0.5, 1, 2, 4] as const;
export const SPEED_KEYS: Record<string, number> = { '1': 0.5, '2': 1, '3': 2, '4': 4 };
/**
 * Slew speed at 1× when the truck profile gives none: 6 °/s, one turn a minute. From memory: rotator
 * and small crane uppers slew at roughly 1–2 rpm at full lever; one turn a minute is the slow end, and a
 * class can follow it.
 */
export const DEFAULT_SLEW_DEG_PER_S = 6;

export interface Arc {
  /** Slew at the pick, degrees. */
  from: number;
  /** Degrees from pick to set (0 … 360). */
  span: number;
  /** +1: counter-clockwise (slew grows), -1: clockwise. The engine's arcOf gives the same three numbers. */
  sign: 1 | -1;
}

export interface ClockState {
  arc: Arc;
  /** Degrees per second at 1×. */
  degPerSecond: number;
  travel: number;
  playing: boolean;
  speed: number;
  loop: boolean;
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

export function createClock(arc: Arc, degPerSecond: number | null | undefined, opts: { speed?: number; loop?: boolean; travel?: number } = {}): ClockState {
  const rate = degPerSecond && degPerSecond > 0 && Number.isFinite(degPerSecond) ? degPerSecond : DEFAULT_SLEW_DEG_PER_S;
  return { arc, degPerSecond: rate, travel: clamp(opts.travel ?? 0, 0, arc.span), playing: false, speed: clamp(opts.speed ?? 1, MIN_SPEED, MAX_SPEED), loop: opts.loop ?? false };
}

/** The slew shown at this travel, 0 ≤ slew < 360 (the engine's slewAt). */
export function slewOf(s: Pick<ClockState, 'arc' | 'travel'>): number {
  const v = (s.arc.from + s.arc.sign * s.travel) % 360;
  return v < 0 ? v + 360 : v;
}

/** Travel from the pick that shows `slew`; null if the slew is off the planned arc. */
export function travelOf(arc: Arc, slew: number): number | null {
  const t = (((arc.sign * (slew - arc.from)) % 360) + 360) % 360;
  if (t <= arc.span + 1e-9) return Math.min(t, arc.span);
  // A full turn's set equals its pick: 0 and 360 are the same slew.
  return null;
}

/** Advances by `dtMs` of wall time. At the set it stops, or with loop on starts again from the pick. */
export function tick(s: ClockState, dtMs: number): ClockState {
  if (!s.playing || dtMs <= 0 || !Number.isFinite(dtMs)) return s;
  const travel = s.travel + (dtMs / 1000) * s.degPerSecond * s.speed;
  if (travel < s.arc.span) return { ...s, travel };
  if (!s.loop || s.arc.span <= 0) return { ...s, travel: s.arc.span, playing: false };
  return { ...s, travel: travel % s.arc.span };
}

/** Play from where it stands; at the set (loop off) playing starts again from the pick. */
export function play(s: ClockState): ClockState {
  const atEnd = s.travel >= s.arc.span;
  return { ...s, playing: s.arc.span > 0, travel: atEnd ? 0 : s.travel };
}
export const pause = (s: ClockState): ClockState => ({ ...s, playing: false });
export const toggle = (s: ClockState): ClockState => (s.playing ? pause(s) : play(s));

/** One whole degree back (-1) or forward (+1) along the arc; pauses. From 12.4° forward is 13°, back is 12°. */
export function step(s: ClockState, dir: 1 | -1): ClockState {
  const eps = 1e-9;
  const next = dir > 0 ? Math.floor(s.travel + eps) + 1 : Math.ceil(s.travel - eps) - 1;
  return { ...s, playing: false, travel: clamp(next, 0, s.arc.span) };
}

export const setSpeed = (s: ClockState, speed: number): ClockState => ({ ...s, speed: clamp(Number.isFinite(speed) ? speed : 1, MIN_SPEED, MAX_SPEED) });
export const setLoop = (s: ClockState, loop: boolean): ClockState => ({ ...s, loop });
export const seek = (s: ClockState, travel: number): ClockState => ({ ...s, travel: clamp(travel, 0, s.arc.span) });

/** Pauses on the engine's worst-case slew (worstCase.slew of its result); unchanged if it is off the arc. */
export function jumpToSlew(s: ClockState, slew: number): ClockState {
  const t = travelOf(s.arc, slew);
  return t === null ? s : { ...s, playing: false, travel: t };
}

/** The profile's slew speed (spec.upper.slewSpeed, °/s) when it has one, else null (the clock's default applies). */
export function profileSlewRate(spec: unknown): number | null {
  const v = (spec as { upper?: { slewSpeed?: unknown } } | null)?.upper?.slewSpeed;
  return typeof v === 'number' && v > 0 && Number.isFinite(v) ? v : null;
}
