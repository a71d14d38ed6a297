import { CAUTION_LINES } from '@/lib/caution';
import { reactionMaxima, type ReactionMaximum } from './bearing';
import { bearingCheck, boomClearanceCheck, clearanceCheck, loadChartCheck, powerLineCheck, riggingCheck, stabilityCheck, lineSubject, type Check, type UpperWeight } from './checks';
import { sideOf } from './names';
import { clearanceOver } from './clearance';
import { boomClearanceOver, boomMeets } from './boom-clearance';
import { percentOfRated } from './load-chart';
import { upperWeight } from './load-weight';
import { powerLineOver } from './power-lines';
import { prepareLift, slewAt, withLoadMass, type PreparedLift } from './prepare';
import { createReactionState, describeReactions, reactionsAt } from './reactions';
import type { LiftResult, WorstCase } from './result';
import { riggingVerdicts, type RiggingVerdict } from './rigging';
import type { LiftInput, LiftInputIn } from './schema';
import { insideDistance } from './support-polygon';
import { sweepSamples, sweepTipping } from './sweep';
import { weightSensitivity } from './sensitivity';
import { assertStandsUnloaded } from './tipping';
import { LiftError } from './errors';

/** Finest sweep step, degrees. */
export const MIN_STEP = 0.01;

export interface AnalyzeOptions {
  /** Sampling step of the swing sweeps, degrees, from MIN_STEP to 1 (the sweep array uses it too). */
  step?: number;
  /**
   * Work out the weight sensitivity (default true). It costs a few dozen reaction sweeps (tens of ms), so a
   * caller that analyses many placements may leave it out; `weightSensitivity` is then null.
   */
  sensitivity?: boolean;
}

function worstCaseOf(p: PreparedLift, step: number): { worst: WorstCase; sweep: ReturnType<typeof sweepTipping> } {
  const sweep = sweepTipping(p, step);
  const w = sweep.worst;
  return {
    sweep,
    worst: {
      slew: w.slew,
      percentOfTipping: w.percentOfTipping,
      line: p.lines[w.line].id,
      tippingLoad: w.percentOfTipping > 0 ? (100 * p.hookLoad) / w.percentOfTipping : null,
    },
  };
}

const liftRigging = (p: PreparedLift) => riggingVerdicts(p.input.rigging, p.input.load.mass, p.hookLoad);

function massChecks(p: PreparedLift, worst: WorstCase, maxima: ReactionMaximum[], rigging: RiggingVerdict[], uw: UpperWeight): Check[] {
  const { limits, soil, supports, loadChart, boom } = p.input;
  const checks = [stabilityCheck(p, worst, limits.percentOfTipping, uw)];
  maxima.forEach((m, i) => checks.push(bearingCheck(p, m, soil.allowable, supports[i].cribbingArea !== undefined, uw)));
  rigging.forEach((r) => checks.push(riggingCheck(r, uw)));
  if (loadChart) checks.push(loadChartCheck(percentOfRated(loadChart, p.radius, boom.length, p.hookLoad), p.radius, boom.length, limits.percentOfRated, uw));
  return checks;
}

/** The whole analysis of a planned lift over its swing. Throws LiftError for input it cannot analyse. */
export function analyzeLift(raw: LiftInputIn | LiftInput, options: AnalyzeOptions = {}): LiftResult {
  return analyzePrepared(prepareLift(raw), options);
}

/** analyzeLift on a lift already prepared (the editor prepares once per edit and keeps it). */
export function analyzePrepared(p: PreparedLift, options: AnalyzeOptions = {}): LiftResult {
  const step = options.step ?? 1;
  // A finer step only adds samples; under 0.01° a full turn would need 36 000+ of them per sweep.
  if (typeof step !== 'number' || !(step >= MIN_STEP && step <= 1)) {
    throw new LiftError('invalid-input', `The sweep step must be from ${MIN_STEP}° to 1°; ${String(step)} is not.`, 'step');
  }
  assertStandsUnloaded(p);
  const { worst, sweep } = worstCaseOf(p, step);

  const state = reactionsAt(p, worst.slew, createReactionState(p.supportX.length));
  const atWorstCase = describeReactions(p, state);
  const maxima = reactionMaxima(p, step);
  const clearances = p.targets.map((t) => clearanceOver(p, t));
  const boomClearances = p.targets.filter(boomMeets).map((t) => boomClearanceOver(p, t));
  const powerLines = p.powerLines.map((l) => powerLineOver(p, l));
  const rigging = liftRigging(p);

  const a = (worst.slew * Math.PI) / 180;
  const hx = Math.cos(a) * p.hookX0 - Math.sin(a) * p.hookY0;
  const hy = Math.sin(a) * p.hookX0 + Math.cos(a) * p.hookY0;
  const W = p.fixedMass + p.rotMass + p.hookLoad;
  const rx = p.rotMx0 * Math.cos(a) - p.rotMy0 * Math.sin(a);
  const ry = p.rotMx0 * Math.sin(a) + p.rotMy0 * Math.cos(a);
  const cgx = (p.fixedMx + rx + p.hookLoad * hx) / W;
  const cgy = (p.fixedMy + ry + p.hookLoad * hy) / W;

  const checks = massChecks(p, worst, maxima, rigging, null);
  clearances.forEach((c) => checks.push(clearanceCheck(c, p.input.limits.clearance)));
  boomClearances.forEach((c) => checks.push(boomClearanceCheck(c, p.input.limits.clearance)));
  powerLines.forEach((l) => checks.push(powerLineCheck(l)));

  let upper: LiftResult['upperWeight'] = null;
  if (p.input.weightUncertainty) {
    const up = withLoadMass(p, upperWeight(p.input.load.mass, p.input.weightUncertainty));
    const u = worstCaseOf(up, step).worst;
    const uMax = reactionMaxima(up, step);
    upper = { loadMass: up.input.load.mass, hookLoad: up.hookLoad, worstCase: u, reactionMaxima: uMax };
    const uw = { percent: p.input.weightUncertainty, loadMass: up.input.load.mass };
    checks.push(...massChecks(up, u, uMax, liftRigging(up), uw));
  }

  const chart = p.input.loadChart;
  return {
    arc: { from: p.from, to: slewAt(p, p.span), direction: p.input.swing.direction, span: p.span, fullTurn: p.fullTurn },
    tippingLines: p.lines.map((l) => ({
      id: l.id, from: l.from, to: l.to, names: lineSubject(p, l.id).names as [string, string], side: sideOf(l.nx, l.ny), distanceFromAxis: l.distanceFromAxis, distanceFromCG: insideDistance(l, cgx, cgy),
      a: { x: l.ax, y: l.ay }, b: { x: l.bx, y: l.by },
    })),
    worstCase: worst,
    sweep: sweepSamples(p, sweep),
    lineChanges: sweep.changes,
    reactions: { atWorstCase, maxima, tipsAtWorstCase: state.tips },
    clearances,
    boomClearances,
    powerLines,
    rigging,
    loadChart: chart ? { ...percentOfRated(chart, p.radius, p.input.boom.length, p.hookLoad), radius: p.radius, boomLength: p.input.boom.length } : null,
    upperWeight: upper,
    weightSensitivity: options.sensitivity === false ? null : weightSensitivity(p, step, sweep),
    hook: { radius: p.radius, tipHeight: p.tipZ, loadBottom: p.loadBottom, hookLoad: p.hookLoad },
    checks,
    caution: CAUTION_LINES,
  };
}
