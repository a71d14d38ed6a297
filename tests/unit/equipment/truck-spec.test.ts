import { describe, expect, it } from 'vitest';
import type { TruckSpec } from '@/lib/equipment/truck-spec';
import { truckSpecSchema } from '@/lib/equipment/truck-spec-rules';
import { CF2_SPEC, DEMO_TRUCKS, HR4_SPEC, HR7_SPEC } from '@/db/seed/demo-trucks';

const clone = (): TruckSpec => structuredClone(HR7_SPEC);

/** Parses a spec edited by `edit` and returns its issues as "path: message" lines. */
function issuesOf(edit: (s: TruckSpec) => void): { path: string; message: string }[] {
  const s = clone();
  edit(s);
  const r = truckSpecSchema.safeParse(s);
  if (r.success) return [];
  return r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}

function expectIssue(edit: (s: TruckSpec) => void, path: string, message: string | RegExp) {
  const issues = issuesOf(edit);
  const hit = issues.find((i) => i.path === path);
  expect(hit, `expected an issue at ${path}; got ${JSON.stringify(issues)}`).toBeDefined();
  if (typeof message === 'string') expect(hit!.message).toBe(message);
  else expect(hit!.message).toMatch(message);
}

describe('truck spec: the demo trucks', () => {
  it('every seeded demo truck passes validation', () => {
    for (const t of DEMO_TRUCKS) expect(truckSpecSchema.safeParse(t.spec).error?.issues ?? []).toEqual([]);
    expect([HR7_SPEC, HR4_SPEC, CF2_SPEC].length).toBe(DEMO_TRUCKS.length);
  });
});

describe('truck spec: masses', () => {
  it('refuses a negative turret mass', () => expectIssue((s) => (s.upper.turret.mass = -10), 'upper.turret.mass', 'Turret mass cannot be negative'));
  it('refuses a negative counterweight mass', () => expectIssue((s) => (s.upper.counterweight.mass = -1), 'upper.counterweight.mass', 'Counterweight mass cannot be negative'));
  it('accepts no counterweight (0 kg)', () => expect(issuesOf((s) => (s.upper.counterweight.mass = 0))).toEqual([]));
  it('refuses a negative or zero carrier mass', () => {
    expectIssue((s) => (s.carrier.mass = -19500), 'carrier.mass', /Carrier mass must be more than 0/);
    expectIssue((s) => (s.carrier.mass = 0), 'carrier.mass', /Carrier mass must be more than 0/);
  });
  it('refuses a negative boom mass', () => expectIssue((s) => (s.boom.mass = -4800), 'boom.mass', /Boom mass must be more than 0/));
  it('refuses a negative pad rating', () => expectIssue((s) => (s.outriggers.legs[0].padRating = -5), 'outriggers.legs.0.padRating', /Pad rating must be more than 0/));
  it('refuses a value that is not a number', () =>
    expectIssue((s) => ((s.carrier as unknown as Record<string, unknown>).mass = 'heavy'), 'carrier.mass', 'Carrier mass must be a number'));
  it('refuses an infinite length', () => expectIssue((s) => (s.carrier.length = Infinity), 'carrier.length', 'Overall length must be a number'));
});

describe('truck spec: carrier outline', () => {
  it('refuses a part whose front is behind its rear', () =>
    expectIssue((s) => (s.carrier.cab.front = 8.5), 'carrier.cab.front', 'Cab front edge (8.5 m) must be ahead of its rear edge (8.8 m)'));
  it('refuses a part past the overall length', () =>
    expectIssue((s) => (s.carrier.cab.front = 12.5), 'carrier.cab.front', 'Cab front edge (12.5 m) is beyond the overall length (12.2 m)'));
  it('refuses a part wider than the truck', () =>
    expectIssue((s) => (s.carrier.body.width = 2.8), 'carrier.body.width', 'Body width (2.8 m) is more than the overall width (2.59 m)'));
  it('refuses a body that overlaps the tailboard', () =>
    expectIssue((s) => (s.carrier.body.rear = 0.5), 'carrier.body.rear', 'Body rear edge (0.5 m) overlaps the tailboard, which ends at 0.9 m'));
  it('refuses a cab that overlaps the body', () =>
    expectIssue((s) => (s.carrier.cab.rear = 8.0), 'carrier.cab.rear', 'Cab rear edge (8 m) overlaps the body, which ends at 8.6 m'));
  it('refuses a carrier CG off the truck', () => expectIssue((s) => (s.carrier.cg.y = 2), 'carrier.cg.x', 'Carrier CG must lie within the overall length and width'));
  it('refuses a slew axis off the truck', () => expectIssue((s) => (s.upper.slewAxis.x = -1), 'upper.slewAxis.x', 'Slew axis must lie within the overall length and width'));
  it('refuses equal slew limits', () =>
    expectIssue((s) => (s.upper.slewLimits = { min: 30, max: 30 }), 'upper.slewLimits.max', 'Slew limits must differ; leave them empty for full rotation'));
});

describe('truck spec: boom', () => {
  it('refuses a stage longer than the next', () =>
    expectIssue(
      (s) => (s.boom.stages[1].length = 15),
      'boom.stages.1.length',
      'Boom stage "First stage out" (15 m) must be shorter than the next stage "Second stage out" (14.6 m): stage lengths increase',
    ));
  it('refuses two stages of equal length', () => expectIssue((s) => (s.boom.stages[1].length = 6.4), 'boom.stages.0.length', /must be shorter than the next stage/));
  it('refuses a CG fraction outside 0–1', () => expectIssue((s) => (s.boom.stages[0].cgFraction = 1.2), 'boom.stages.0.cgFraction', 'Boom CG fraction must be between 0 and 1'));
  it('refuses an elevation range upside down', () =>
    expectIssue((s) => (s.boom.elevation = { min: 40, max: 10 }), 'boom.elevation.max', 'Highest elevation (10°) must be above the lowest (40°)'));
  it('refuses an elevation beyond 90°', () => expectIssue((s) => (s.boom.elevation.max = 95), 'boom.elevation.max', 'Highest elevation must be between -30° and 90°'));
});

describe('truck spec: outriggers', () => {
  it('refuses a leg whose pad stays inside the body outline at full reach', () =>
    expectIssue(
      (s) => (s.outriggers.legs[0].stages = { retracted: 0.1, intermediate: 0.2, full: 0.5 }),
      'outriggers.legs.0.stages.full',
      'Leg FL: at full reach the pad is still inside the body outline; check the mount, direction and reach',
    ));
  it('refuses a leg pointing into the truck', () =>
    expectIssue((s) => (s.outriggers.legs[0].direction = 0), 'outriggers.legs.0.stages.full', /Leg FL: at full reach the pad is still inside the body outline/));
  it('refuses a leg mounted off the carrier', () =>
    expectIssue((s) => (s.outriggers.legs[1].mount.y = -2), 'outriggers.legs.1.mount.x', 'Leg FR mount must be on the carrier, within its overall length and width'));
  it('refuses a retracted reach longer than the intermediate one', () =>
    expectIssue(
      (s) => (s.outriggers.legs[2].stages.retracted = 2.0),
      'outriggers.legs.2.stages.retracted',
      'Leg RL: retracted reach (2 m) must be shorter than the intermediate reach (1.8 m)',
    ));
  it('refuses an intermediate reach longer than full', () =>
    expectIssue(
      (s) => (s.outriggers.legs[3].stages.intermediate = 3.1),
      'outriggers.legs.3.stages.intermediate',
      'Leg RR: intermediate reach (3.1 m) must be shorter than the full reach (2.9 m)',
    ));
  it('without an intermediate stop, compares retracted with full', () =>
    expectIssue(
      (s) => (s.outriggers.legs[4].stages = { retracted: 1, intermediate: null, full: 0.9 }),
      'outriggers.legs.4.stages.retracted',
      'Leg FJ: retracted reach (1 m) must be shorter than the full reach (0.9 m)',
    ));
  it('refuses a leg id used twice', () => expectIssue((s) => (s.outriggers.legs[1].id = 'FL'), 'outriggers.legs.1.id', 'Leg id FL is used twice'));
  it('refuses a badly formed leg id', () => expectIssue((s) => (s.outriggers.legs[1].id = 'front left'), 'outriggers.legs.1.id', 'Leg id is 1–4 capital letters or digits, e.g. FL, RR, FJ'));
  it('refuses fewer than three legs', () => expectIssue((s) => (s.outriggers.legs = s.outriggers.legs.slice(0, 2)), 'outriggers.legs', 'A truck needs at least 3 outrigger legs or jacks'));
  it('refuses a zero pad size', () => expectIssue((s) => (s.outriggers.legs[0].pad.width = 0), 'outriggers.legs.0.pad.width', 'Pad width must be more than 0'));
});

describe('truck spec: winches', () => {
  it('refuses a fractional parts-of-line count', () => expectIssue((s) => (s.winches[0].maxParts = 2.5), 'winches.0.maxParts', 'Parts of line must be a whole number'));
  it('refuses a zero line pull', () => expectIssue((s) => (s.winches[1].ratedLinePull = 0), 'winches.1.ratedLinePull', 'Rated line pull must be more than 0'));
});

describe('truck spec: load chart', () => {
  it('refuses radii that do not strictly increase', () =>
    expectIssue((s) => (s.loadChart.radii[3] = 4), 'loadChart.radii.3', 'Load chart radius 4 m must be more than the row above (4 m): radii strictly increase'));
  it('refuses boom lengths that do not strictly increase', () =>
    expectIssue((s) => (s.loadChart.boomLengths = [6.4, 14.6, 10.4]), 'loadChart.boomLengths.2', 'Load chart boom length 10.4 m must be more than the column before (14.6 m)'));
  it('refuses a boom length the boom cannot reach', () =>
    expectIssue((s) => (s.loadChart.boomLengths[2] = 16), 'loadChart.boomLengths.2', "Load chart boom length 16 m is outside the boom's range (6.4 m to 14.6 m)"));
  it('refuses a missing row', () =>
    expectIssue((s) => s.loadChart.rated.pop(), 'loadChart.rated', 'Load chart has 8 radii but 7 rows of rated loads: every radius needs its row'));
  it('refuses an empty row', () =>
    expectIssue((s) => (s.loadChart.rated[7] = [null, null, null]), 'loadChart.rated.7', 'Load chart row at 12 m has no rated loads: fill it or remove the radius'));
  it('refuses a row with a missing cell', () =>
    expectIssue((s) => (s.loadChart.rated[2] = [30000, 25000]), 'loadChart.rated.2', 'Load chart row 3 has 2 cells but there are 3 boom lengths'));
  it('refuses a rated load that rises with radius', () =>
    expectIssue(
      (s) => (s.loadChart.rated[4][1] = 21000),
      'loadChart.rated.4.1',
      'Rated load 21000 kg at 6 m, boom 10.4 m is more than 20000 kg at the smaller radius 5 m: rated loads must not rise with radius',
    ));
  it('compares across a gap of empty cells', () =>
    expectIssue((s) => (s.loadChart.rated[4][0] = 23000), 'loadChart.rated.4.0', /23000 kg at 6 m, boom 6.4 m is more than 22000 kg at the smaller radius 5 m/));
  it('accepts equal rated loads at two radii (non-increasing)', () => expect(issuesOf((s) => (s.loadChart.rated[1][2] = 27000))).toEqual([]));
  it('refuses a zero or negative rated load', () =>
    expectIssue((s) => (s.loadChart.rated[0][0] = 0), 'loadChart.rated.0.0', 'Rated load must be more than 0; leave the cell empty where the chart gives no rating'));
  it('refuses a sector of no width', () =>
    expectIssue((s) => (s.loadChart.conditions.sector = { from: 90, to: 90 }), 'loadChart.conditions.sector.to', 'Chart sector must span some angle; leave it empty for 360°'));
  it('refuses an unknown support condition', () =>
    expectIssue(
      (s) => ((s.loadChart.conditions as unknown as Record<string, unknown>).supports = 'crawlers'),
      'loadChart.conditions.supports',
      'Chart supports must be outriggers (full, intermediate or retracted) or on tyres',
    ));
});

// Source: issue 11 — a profile with 1e300 figures saved; the ranges are the lift engine's own (lib/lift/range.ts).
describe('truck spec: physical ranges', () => {
  it('refuses masses past 10,000 t with the range named', () => {
    expectIssue((s) => (s.carrier.mass = 1e300), 'carrier.mass', 'Carrier mass must be at most 10,000,000 kg');
    expectIssue((s) => (s.upper.counterweight.mass = 2e7), 'upper.counterweight.mass', /Counterweight mass must be at most 10,000,000 kg/);
    expectIssue((s) => (s.outriggers.legs[0]!.padRating = 1e12), 'outriggers.legs.0.padRating', /Pad rating must be at most 10,000,000 kg/);
    expectIssue((s) => (s.loadChart.rated[0]![0] = 1e300), 'loadChart.rated.0.0', /Rated load must be at most 10,000,000 kg/);
  });
  it('refuses lengths past 200 m and positions past 100 m from the truck', () => {
    expectIssue((s) => (s.carrier.length = 1e300), 'carrier.length', /Overall length must be at most 200 m/);
    expectIssue((s) => (s.boom.stages[0]!.length = 250), 'boom.stages.0.length', /Stage length must be at most 200 m/);
    expectIssue((s) => (s.outriggers.legs[0]!.mount.x = 1e6), 'outriggers.legs.0.mount.x', 'Leg mount x must be from -100 to 100 m');
    expectIssue((s) => (s.upper.slewAxis.y = -101), 'upper.slewAxis.y', 'Slew axis y must be from -100 to 100 m');
  });
  it('accepts the largest figures in range', () => {
    expect(issuesOf((s) => (s.upper.counterweight.mass = 9_999_999))).toEqual([]);
  });
});
