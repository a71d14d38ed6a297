'use client';
import { useEditorState } from '../editor-context';
import { formatLength, formatPressure } from '@/lib/format/quantity';
import { cx } from '@/components/ui/cx';
import { clearanceFigure } from '@/lib/replay/headline-figures';
import { knownPadName, tippingLineLabel } from '@/lib/lift/names';

const pct = (v: number) => `${v.toFixed(1)} %`;

/**
 * The engine's figures at the slew shown (the same snapshot the plan is drawn from, so the two cannot
 * disagree): slew, % of tipping and the governing line, clearance now, pad reactions as bars.
 * `hidden` keeps the answers back while a class predicts them.
 */
export function FiguresPanel({ big = false, hidden = false }: { big?: boolean; hidden?: boolean }) {
  const a = useEditorState((s) => s.analysis);
  const doc = useEditorState((s) => s.document);
  const units = useEditorState((s) => s.units);
  const snap = a?.snapshot ?? null;
  const names = a?.lift.ok ? a.lift.names : {};
  const label = big ? 'text-[22px] font-semibold uppercase tracking-wide opacity-80' : 'text-xs font-semibold uppercase tracking-wide text-ink-muted';
  const figure = big ? 'text-[44px] font-bold leading-tight tabular-nums' : 'text-2xl font-bold tabular-nums';
  if (!a || !a.lift.ok || !snap) {
    const why = a && !a.lift.ok ? a.lift.problem.message : a?.error?.message ?? 'Working out the swing…';
    return <p className={big ? 'text-[28px]' : 'text-sm'}>{why}</p>;
  }
  const governing = snap.governing;
  const over = governing ? governing.percentOfTipping > doc.limits.percentOfTipping : true;
  let gap: { value: number; target: string } | null = null;
  for (const c of snap.clearances) {
    const v = clearanceFigure(c);
    if (!gap || v < gap.value) gap = { value: v, target: c.target };
  }
  const allow = doc.soil.allowable;
  return (
    <div className={cx('grid gap-3', big && 'gap-5')} data-testid="replay-figures">
      <div>
        <p className={label}>Slew shown</p>
        <p className={figure} data-testid="replay-slew">
          {snap.slew.toFixed(1)}°
        </p>
      </div>
      {hidden ? (
        <p className={cx(big ? 'text-[30px]' : 'text-base', 'rounded border-2 border-dashed p-3 font-semibold')} data-testid="results-hidden">
          Results hidden: where is the worst angle, and which pad carries most?
        </p>
      ) : (
        <>
          <div>
            <p className={label}>% of tipping now</p>
            <p className={cx(figure, over && (big ? 'text-[#FF8A80]' : 'text-over'))} data-testid="replay-percent">
              {governing ? pct(governing.percentOfTipping) : 'tips unloaded'}
            </p>
            <p className={big ? 'text-[28px]' : 'text-sm'}>
              {governing ? `about ${tippingLineLabel(governing.line)}` : `tips about ${tippingLineLabel(snap.tipsUnloadedAbout ?? '')} with nothing on the hook`} · limit {doc.limits.percentOfTipping} %{over ? ' · over limit' : ''}
            </p>
          </div>
          {a.result && (
            <p className={big ? 'text-[28px]' : 'text-sm'} data-testid="replay-worst">
              Worst over the swing: <b>{pct(a.result.worstCase.percentOfTipping)}</b> at {a.result.worstCase.slew.toFixed(1)}° about {tippingLineLabel(a.result.worstCase.line)}
            </p>
          )}
          <div>
            <p className={label}>Least clearance now</p>
            <p className={cx(big ? 'text-[32px] font-bold' : 'text-lg font-semibold', gap && gap.value < doc.limits.clearance && (big ? 'text-[#FF8A80]' : 'text-over'))} data-testid="replay-clearance">
              {gap ? `${formatLength(gap.value, units)} to ${names[gap.target] ?? 'a truck part or obstacle'}` : 'no truck parts or obstacles to clear'}
            </p>
          </div>
          <div>
            <p className={label}>Pad pressure now (allowable {formatPressure(allow, units)})</p>
            <ul className="mt-1 grid gap-1.5" data-testid="pad-bars">
              {snap.reactions.map((r) => {
                const share = Math.min(1, r.groundPressure / allow);
                const overPad = r.groundPressure > allow;
                return (
                  <li key={r.support} className={cx('grid items-center gap-2', big ? 'grid-cols-[13rem_1fr_11rem] text-[28px]' : 'grid-cols-[7rem_1fr_6.5rem] text-sm')}>
                    <span className="truncate font-semibold" title={r.support}>
                      {knownPadName(r.support) ?? r.support} {knownPadName(r.support) && <span className="font-normal opacity-70">{r.support}</span>}
                    </span>
                    <span className={cx('relative block overflow-hidden rounded-sm border', big ? 'h-7 border-paper/60' : 'h-3.5 border-ink/40')}>
                      <span
                        className={cx('absolute inset-y-0 left-0', overPad ? 'bg-over' : big ? 'bg-signal' : 'bg-teal')}
                        style={{ width: `${(share * 100).toFixed(1)}%`, backgroundImage: overPad ? 'repeating-linear-gradient(45deg,transparent 0 4px,rgba(255,255,255,.5) 4px 7px)' : undefined }}
                      />
                    </span>
                    <span className="text-right tabular-nums">{r.inContact ? formatPressure(r.groundPressure, units) : 'lifted off'}</span>
                  </li>
                );
              })}
            </ul>
          </div>
        </>
      )}
    </div>
  );
}
