import { describe, expect, it } from 'vitest';
import { analyzeAtSlew, analyzeLift, arcOf, prepareLift } from '@/lib/lift';
import { DEFAULT_SLEW_DEG_PER_S, createClock, jumpToSlew, pause, play, setLoop, setSpeed, slewOf, step, tick, travelOf } from '@/lib/replay/playback-clock';
import { rotator, squareOfPads } from '@/tests/lift/scenarios';

const cw = { from: 260, span: 160, sign: -1 } as const; // 260° → 100° clockwise

describe('playback clock: speed', () => {
  it('turns degPerSecond × speed degrees per second of wall time', () => {
    let c = play(createClock(cw, 5));
    c = tick(c, 1000);
    expect(c.travel).toBeCloseTo(5, 12);
    expect(slewOf(c)).toBeCloseTo(255, 12);
    c = tick(setSpeed(c, 4), 500);
    expect(c.travel).toBeCloseTo(15, 12);
    c = tick(setSpeed(c, 0.25), 2000);
    expect(c.travel).toBeCloseTo(17.5, 12);
  });
  it('keeps speed within 0.25×–4× and falls back to the documented default rate', () => {
    expect(setSpeed(createClock(cw, 5), 10).speed).toBe(4);
    expect(setSpeed(createClock(cw, 5), 0.1).speed).toBe(0.25);
    expect(createClock(cw, null).degPerSecond).toBe(DEFAULT_SLEW_DEG_PER_S);
    expect(createClock(cw, 0).degPerSecond).toBe(6);
  });
  it('does not move while paused, and ignores a negative or broken frame time', () => {
    const c = createClock(cw, 5, { travel: 10 });
    expect(tick(c, 1000).travel).toBe(10);
    const p = play(c);
    expect(tick(p, -16).travel).toBe(10);
    expect(tick(p, Number.NaN).travel).toBe(10);
  });
});

describe('playback clock: step', () => {
  it('steps to the next or previous whole degree and pauses', () => {
    const c = play(createClock(cw, 5, { travel: 12.4 }));
    expect(step(c, 1)).toMatchObject({ travel: 13, playing: false });
    expect(step(c, -1).travel).toBe(12);
    expect(step(createClock(cw, 5, { travel: 12 }), 1).travel).toBe(13);
    expect(step(createClock(cw, 5, { travel: 12 }), -1).travel).toBe(11);
  });
  it('stays on the arc at both ends', () => {
    expect(step(createClock(cw, 5), -1).travel).toBe(0);
    expect(step(createClock(cw, 5, { travel: 160 }), 1).travel).toBe(160);
    expect(slewOf(step(createClock(cw, 5, { travel: 159.5 }), 1))).toBe(100);
  });
});

describe('playback clock: the end of the arc and loop', () => {
  it('stops at the set with loop off, and playing again starts from the pick', () => {
    let c = tick(play(createClock(cw, 10, { travel: 150 })), 2000);
    expect(c).toMatchObject({ travel: 160, playing: false });
    c = play(c);
    expect(c).toMatchObject({ travel: 0, playing: true });
  });
  it('wraps past the set to the pick with loop on, keeping the overshoot', () => {
    const c = tick(play(setLoop(createClock(cw, 10, { travel: 150 }), true)), 2000);
    expect(c.playing).toBe(true);
    expect(c.travel).toBeCloseTo(10, 12);
    expect(slewOf(c)).toBeCloseTo(250, 12);
  });
  it('maps slews to travel on a counter-clockwise arc through 0°', () => {
    const ccw = { from: 300, span: 120, sign: 1 } as const; // 300° → 60°
    expect(travelOf(ccw, 0)).toBeCloseTo(60, 12);
    expect(travelOf(ccw, 60)).toBeCloseTo(120, 12);
    expect(travelOf(ccw, 200)).toBeNull();
    expect(pause(jumpToSlew(play(createClock(ccw, 6)), 200)).travel).toBe(0);
  });
});

describe('playback clock: jump to the worst case', () => {
  // The worst case comes from the engine (analyzeLift); the clock must land on exactly that slew, and the
  // engine's figures at the slew shown must be the worst case's.
  for (const [name, input] of [
    ['square of pads, full turn', squareOfPads()],
    ['rotator, clockwise part swing', rotator({ swing: { from: 250, to: 110, direction: 'cw' } })],
  ] as const) {
    it(`lands on the engine's worst angle: ${name}`, () => {
      const result = analyzeLift(input);
      const p = prepareLift(input);
      const arc = arcOf(p.input.swing);
      const c = jumpToSlew(play(createClock(arc, 6)), result.worstCase.slew);
      expect(c.playing).toBe(false);
      expect(slewOf(c)).toBeCloseTo(result.worstCase.slew, 9);
      const snap = analyzeAtSlew(p, slewOf(c));
      expect(snap.governing?.line).toBe(result.worstCase.line);
      expect(snap.governing?.percentOfTipping).toBeCloseTo(result.worstCase.percentOfTipping, 6);
      // A degree either side is not worse: it is a maximum along the arc.
      for (const dir of [1, -1] as const) {
        const near = analyzeAtSlew(p, slewOf(step(c, dir)));
        expect(near.governing!.percentOfTipping).toBeLessThanOrEqual(result.worstCase.percentOfTipping + 1e-9);
      }
    });
  }
});
