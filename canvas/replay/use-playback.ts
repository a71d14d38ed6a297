'use client';
import { useCallback, useEffect, useRef, useState } from 'react';
import { arcOf } from '@/lib/lift';
import { createClock, jumpToSlew, seek, setLoop, setSpeed, slewOf, step, tick, toggle, type ClockState } from '@/lib/replay/playback-clock';
import type { EditorStore } from '../store/editor-store';

export interface Playback {
  clock: ClockState;
  toggle(): void;
  step(dir: 1 | -1): void;
  setSpeed(v: number): void;
  setLoop(v: boolean): void;
  seek(travel: number): void;
  worst(): void;
}

/**
 * Runs the clock from requestAnimationFrame. Each frame advances the clock and sets the slew in the store;
 * the live analysis computes the engine's snapshot for that slew synchronously inside the same set, so the
 * plan and every figure render from one snapshot (never a frame behind each other).
 */
export function usePlayback(store: EditorStore, degPerSecond: number | null): Playback {
  const swing = store.getState().document.swing;
  const make = () => createClock(arcOf(store.getState().document.swing), degPerSecond);
  const [clock, setClock] = useState(make);
  // The clock as of the last frame, for the animation loop's callbacks.
  const ref = useRef<ClockState>(clock);

  const apply = useCallback(
    (next: ClockState) => {
      ref.current = next;
      store.getState().set({ scrubSlew: slewOf(next) });
      setClock(next);
    },
    [store],
  );

  // A what-if that moves the pick or set starts a new arc.
  useEffect(() => {
    const c = ref.current;
    const arc = arcOf(swing);
    if (c.arc.from !== arc.from || c.arc.span !== arc.span || c.arc.sign !== arc.sign) apply({ ...createClock(arc, degPerSecond, { speed: c.speed, loop: c.loop }) });
    else apply(c);
  }, [swing.from, swing.to, swing.direction]); // eslint-disable-line react-hooks/exhaustive-deps

  useEffect(() => {
    let raf = 0;
    let last: number | null = null;
    const frame = (now: number) => {
      const c = ref.current;
      if (c.playing && last !== null) apply(tick(c, now - last));
      last = now;
      raf = requestAnimationFrame(frame);
    };
    raf = requestAnimationFrame(frame);
    return () => cancelAnimationFrame(raf);
  }, [apply]);

  return {
    clock,
    toggle: () => apply(toggle(ref.current)),
    step: (dir) => apply(step(ref.current, dir)),
    setSpeed: (v) => apply(setSpeed(ref.current, v)),
    setLoop: (v) => apply(setLoop(ref.current, v)),
    seek: (t) => apply(seek({ ...ref.current, playing: false }, t)),
    worst: () => {
      const r = store.getState().analysis?.result;
      if (r) apply(jumpToSlew(ref.current, r.worstCase.slew));
    },
  };
}
