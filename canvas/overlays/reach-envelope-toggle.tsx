'use client';
import { CAUTION_LINES } from '@/lib/caution';
import { formatMass } from '@/lib/format/quantity';
import { formatNumber } from '@/lib/format/number';
import { useEditorState } from '../editor-context';
import { ENVELOPE_STYLE } from './envelope-picture';
import { envelopeStore, useEnvelopeState } from './reach-envelope-store';
import { useReachEnvelope } from './use-reach-envelope';

function Swatch({ fill, alpha, hatch }: { fill: string; alpha: number; hatch?: boolean }) {
  return (
    <span
      aria-hidden
      className="inline-block h-3 w-4 shrink-0 rounded-sm border border-ink/20"
      style={{ background: hatch ? `repeating-linear-gradient(45deg, ${fill} 0 2px, transparent 2px 5px)` : fill, opacity: hatch ? 0.9 : Math.min(1, alpha * 2.2) }}
    />
  );
}

function LineKey({ stroke, dash }: { stroke: string; dash: readonly number[] }) {
  return (
    <svg aria-hidden width="18" height="8" className="shrink-0">
      <line x1="0" y1="4" x2="18" y2="4" stroke={stroke} strokeWidth="2.5" strokeDasharray={dash.length ? dash.map((d) => d / 2).join(' ') : undefined} />
    </svg>
  );
}

/** Button to show the reach envelope on the plan, and its key while it is shown (top left of the plan). */
export function ReachEnvelopeToggle() {
  useReachEnvelope();
  const { on, grid, cutBy, ms, where, busy } = useEnvelopeState((s) => s);
  const units = useEditorState((s) => s.units);
  const uncertain = useEditorState((s) => (s.analysis?.lift.ok ? (s.analysis.lift.input.weightUncertainty ?? 0) > 0 : false));
  return (
    <div className="absolute left-3 top-3 z-10 max-w-[16rem] text-xs" data-testid="reach-envelope">
      <button
        type="button"
        aria-pressed={on}
        onClick={() => envelopeStore.set({ on: !on })}
        className={`rounded-md border-2 px-2.5 py-1.5 font-semibold shadow-sm ${on ? 'border-teal bg-teal text-white' : 'border-ink/30 bg-paper-raised/95 text-ink'}`}
        data-testid="reach-envelope-toggle"
      >
        {on ? 'Hide' : 'Show'} where the load can be held
      </button>
      {on && (
        <details open className="mt-1.5 rounded-md border border-ink/20 bg-paper-raised/95 p-2 shadow-sm" data-testid="reach-envelope-key">
          <summary className="cursor-pointer font-semibold">Key</summary>
          <div className="mt-1 space-y-1">
            {!grid ? (
              <p>{busy ? 'Working out the envelope…' : 'Place the truck and the load to see where the load can be held.'}</p>
            ) : (
              <>
                <p>
                  Within the plan’s tipping and chart limits, slewed there from the pick{uncertain ? ` at the upper weight, ${formatMass(grid.loadMass, units)}` : ''}; boom raised or lowered at its length.
                </p>
                <p className="flex flex-wrap items-center gap-1.5"><Swatch {...ENVELOPE_STYLE.ample} /> under 60 % <Swatch {...ENVELOPE_STYLE.fair} /> 60–90 % <Swatch {...ENVELOPE_STYLE.near} /> within 10 % of a limit</p>
                <p className="flex items-center gap-1.5"><LineKey stroke={ENVELOPE_STYLE.tipping.stroke} dash={ENVELOPE_STYLE.tipping.dash} /> tipping <LineKey stroke={ENVELOPE_STYLE.chart.stroke} dash={ENVELOPE_STYLE.chart.dash} /> load chart <LineKey stroke={ENVELOPE_STYLE.reach.stroke} dash={ENVELOPE_STYLE.reach.dash} /> reach</p>
                {cutBy.length > 0 && (
                  <p className="flex items-center gap-1.5" data-testid="reach-envelope-cut"><Swatch fill={ENVELOPE_STYLE.cut.fill} alpha={1} hatch /> load meets {cutBy.length > 4 ? `${cutBy.slice(0, 3).join(', ')} and ${cutBy.length - 3} more` : cutBy.join(', ')}</p>
                )}
                <p className="text-ink-muted">{CAUTION_LINES[0]}</p>
                {ms !== null && <p className="text-ink-muted" data-testid="reach-envelope-ms">Worked out in {formatNumber(ms)} ms{where === 'worker' ? ' beside the editor' : ''}{busy ? '; updating…' : ''}.</p>}
              </>
            )}
          </div>
        </details>
      )}
    </div>
  );
}
