'use client';
import { useEditorContext, useEditorState } from '../editor-context';
import { setSlew } from '../commands/truck';
import { useDisplaySlew } from '../view/use-display-slew';
import { LiveReadout } from './live-readout';
import { arcOf } from '@/lib/lift/swing';

/** The slew slider under the plan: drag it, or use ← →; the boom, the load and every readout follow. */
export function SlewScrubber() {
  const { store } = useEditorContext();
  const slew = useDisplaySlew();
  const readOnly = useEditorState((s) => s.readOnly);
  const swing = useEditorState((s) => s.document.swing);
  if (slew === null) {
    return <div className="border-t border-paper-line bg-paper-raised px-3 py-2 text-sm text-ink-muted">Place the truck (T) to slew the boom and see the swing check.</div>;
  }
  const apply = (v: number, capture: 'gesture' | 'commit') => {
    if (readOnly) store.getState().set({ scrubSlew: v });
    else store.getState().run(setSlew(v, capture));
  };
  return (
    <div className="flex shrink-0 flex-wrap items-center gap-x-3 gap-y-1 border-t border-paper-line bg-paper-raised px-3 py-1.5">
      <label htmlFor="slew" className="text-sm font-semibold">
        Slew
      </label>
      <input
        id="slew"
        data-testid="slew-slider"
        type="range"
        min={0}
        max={359}
        step={1}
        value={Math.round(slew) % 360}
        aria-valuetext={`${Math.round(slew)}°`}
        onChange={(e) => apply(Number(e.target.value), 'gesture')}
        onPointerUp={(e) => apply(Number((e.target as HTMLInputElement).value), 'commit')}
        onKeyUp={(e) => apply(Number((e.target as HTMLInputElement).value), 'commit')}
        className="h-11 min-w-[160px] flex-1 accent-teal"
      />
      <span className="w-14 text-right text-lg font-semibold tabular-nums" data-testid="slew-value">
        {Math.round(slew * 10) / 10}°
      </span>
      <span className="text-xs text-ink-muted">
        pick {swing.from}° → set {swing.to}° {swing.direction === 'ccw' ? '(counter-clockwise)' : '(clockwise)'}
        {arcOf(swing).fullTurn ? ', a full turn' : ''}
      </span>
      <LiveReadout />
    </div>
  );
}
