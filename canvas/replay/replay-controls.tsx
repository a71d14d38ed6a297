'use client';
import { SPEEDS, MAX_SPEED, MIN_SPEED } from '@/lib/replay/playback-clock';
import type { Playback } from './use-playback';
import { cx } from '@/components/ui/cx';

const shape = 'inline-flex min-h-touch items-center justify-center rounded-plate border-2 border-ink px-3 font-semibold';
const btn = `${shape} bg-paper-raised hover:bg-paper-sunk`;

/** Play/pause, step, worst case, speed, loop and a position slider along the planned arc. */
export function ReplayControls({ playback, rate, canWorst }: { playback: Playback; rate: number; canWorst: boolean }) {
  const c = playback.clock;
  return (
    <div className="flex flex-wrap items-center gap-2" data-testid="replay-controls">
      <button type="button" className={cx(shape, 'min-w-24 bg-ink text-paper-raised hover:bg-ink-soft')} data-testid="play-pause" onClick={playback.toggle} aria-keyshortcuts="Space">
        {c.playing ? 'Pause' : 'Play'}
      </button>
      <button type="button" className={btn} onClick={() => playback.step(-1)} aria-label="One degree back" aria-keyshortcuts="ArrowLeft">
        −1°
      </button>
      <button type="button" className={btn} onClick={() => playback.step(1)} aria-label="One degree forward" aria-keyshortcuts="ArrowRight">
        +1°
      </button>
      <button type="button" className={btn} onClick={playback.worst} disabled={!canWorst} aria-keyshortcuts="W">
        Worst case
      </button>
      <label className="flex items-center gap-1 text-sm font-semibold">
        Speed
        <select
          className="min-h-touch rounded-plate border-2 border-ink bg-paper-raised px-2"
          value={c.speed}
          onChange={(e) => playback.setSpeed(Number(e.target.value))}
          aria-label={`Speed, ${MIN_SPEED}× to ${MAX_SPEED}×`}
        >
          {SPEEDS.map((s) => (
            <option key={s} value={s}>
              {s}×
            </option>
          ))}
        </select>
      </label>
      <label className="flex min-h-touch items-center gap-1.5 text-sm font-semibold">
        <input type="checkbox" className="h-5 w-5 accent-teal" checked={c.loop} onChange={(e) => playback.setLoop(e.target.checked)} />
        Loop
      </label>
      <input
        type="range"
        aria-label="Position along the swing"
        className="h-11 min-w-[140px] flex-1 accent-teal"
        min={0}
        max={c.arc.span}
        step={0.1}
        value={c.travel}
        onChange={(e) => playback.seek(Number(e.target.value))}
      />
      <span className="text-xs text-ink-muted">1× = {rate} °/s</span>
    </div>
  );
}
