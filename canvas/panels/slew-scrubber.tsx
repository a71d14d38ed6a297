'use client';
import { useState } from 'react';
import { useEditorContext, useEditorState } from '../editor-context';
import { setSlew } from '../commands/truck';
import { useDisplaySlew } from '../view/use-display-slew';
import { LiveReadout } from './live-readout';
import { CautionLine } from './caution-line';
import { arcOf } from '@/lib/lift/swing';
import { wrap360 } from '@/lib/angles';
import { useTouch } from './use-touch';

const fmt = (d: number) => `${Math.round(d * 10) / 10}°`;

/**
 * The slew slider under the plan. It runs along the planned swing, pick at the left end and set at the
 * right; "Whole circle" opens the rest of the turn (and it opens by itself when the boom stands outside the
 * swing). Drag it, or use ← →; the boom, the load and every readout follow.
 */
export function SlewScrubber() {
  const { store } = useEditorContext();
  const slew = useDisplaySlew();
  const readOnly = useEditorState((s) => s.readOnly);
  const swing = useEditorState((s) => s.document.swing);
  const touch = useTouch();
  const [whole, setWhole] = useState(false);
  if (slew === null) {
    return (
      <div className="flex shrink-0 flex-wrap items-center justify-between gap-x-4 gap-y-1 border-t border-paper-line bg-paper-raised px-3 py-2 text-sm text-ink-muted">
        <span>{touch ? 'Tap the truck tool, then tap the plan,' : 'Place the truck (T)'} to slew the boom and see the swing check.</span>
        <CautionLine />
      </div>
    );
  }
  const arc = arcOf(swing);
  // Offset from the pick along the swing's direction, 0–360.
  const offset = wrap360(arc.sign * (slew - arc.from));
  const onArc = arc.fullTurn || offset <= arc.span + 1e-6;
  const circle = whole || arc.fullTurn || arc.span === 0 || !onArc;
  const toSlew = (v: number) => (circle ? v : wrap360(arc.from + arc.sign * v));
  const apply = (v: number, capture: 'gesture' | 'commit') => {
    const s = toSlew(v);
    if (readOnly) store.getState().set({ scrubSlew: s });
    else store.getState().run(setSlew(s, capture));
  };
  const value = circle ? Math.round(slew * 10) / 10 : Math.round(offset * 10) / 10;
  return (
    <div className="flex shrink-0 flex-wrap items-center gap-x-3 gap-y-1 border-t border-paper-line bg-paper-raised px-3 py-1.5" data-testid="slew-bar">
      <label htmlFor="slew" className="text-sm font-semibold">
        Slew
      </label>
      <div className="flex min-w-[180px] flex-1 flex-col">
        <input
          id="slew"
          data-testid="slew-slider"
          data-range={circle ? 'circle' : 'swing'}
          type="range"
          min={0}
          max={circle ? 359.9 : Math.round(arc.span * 10) / 10}
          step={0.1}
          value={value}
          aria-valuetext={fmt(slew)}
          onChange={(e) => apply(Number(e.target.value), 'gesture')}
          onPointerUp={(e) => apply(Number((e.target as HTMLInputElement).value), 'commit')}
          onKeyUp={(e) => apply(Number((e.target as HTMLInputElement).value), 'commit')}
          className="h-8 w-full accent-teal"
        />
        <div className="flex justify-between text-[0.7rem] leading-none text-ink-muted" aria-hidden>
          {circle ? (
            <>
              <span>0° (over the cab)</span>
              <span>180°</span>
              <span>359.9°</span>
            </>
          ) : (
            <>
              <span>pick {fmt(swing.from)}</span>
              <span>{swing.direction === 'ccw' ? 'counter-clockwise' : 'clockwise'}</span>
              <span>set {fmt(swing.to)}</span>
            </>
          )}
        </div>
      </div>
      <span className="w-16 text-right text-lg font-semibold tabular-nums" data-testid="slew-value">
        {fmt(slew)}
      </span>
      {!arc.fullTurn && arc.span > 0 && (
        <label className="flex min-h-11 items-center gap-1.5 text-xs">
          <input type="checkbox" className="h-4 w-4 accent-teal" checked={circle} disabled={!onArc} onChange={(e) => setWhole(e.target.checked)} data-testid="slew-whole-circle" />
          Whole circle{!onArc && <span className="font-semibold text-signal-dark"> (outside the swing)</span>}
        </label>
      )}
      <LiveReadout />
      <CautionLine className="basis-full" />
    </div>
  );
}
