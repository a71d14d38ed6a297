'use client';
import { CautionNote } from '@/components/caution-note';
import { noneBetter, truckStanding, type Standing } from '@/lib/advisor/standing';
import type { Proposal } from '@/lib/advisor/types';
import { formatAngle, formatLength } from '@/lib/format/quantity';
import type { UnitSystem } from '@/lib/units';
import { useEditorContext, useEditorState } from '../editor-context';
import { ProposalFigures, marginWords } from './proposal-figures';
import { clearUsableArea, finishUsableArea } from './usable-area-actions';
import { useUsableAreaDraft } from './usable-area-store';
import { useAdvisor } from './use-advisor';
import { useMemo } from 'react';

const PHASE: Record<string, string> = { grid: 'Trying positions and headings', refine: 'Refining the best', legs: 'Trying leg extensions', confirm: 'Checking the best in full' };

const btn = 'min-h-11 rounded-md px-3 text-sm font-semibold disabled:opacity-50';

/** Searches truck placements for the best least margin and applies one as a new revision. */
export function AdvisorPanel() {
  const { editor } = useEditorContext();
  const doc = useEditorState((s) => s.document);
  const profiles = useEditorState((s) => s.profiles);
  const readOnly = useEditorState((s) => s.readOnly);
  const units = useEditorState((s) => s.units);
  const model = useEditorState((s) => s.truck);
  const draft = useUsableAreaDraft();
  const { run, start, cancel, reset } = useAdvisor();
  const truck = doc.objects.find((o) => o.kind === 'truck');
  const hasLoad = doc.objects.some((o) => o.kind === 'load');
  const profile = truck?.kind === 'truck' ? profiles.find((p) => p.id === truck.profileId) : undefined;
  // Where the truck as drawn stands, by the search's own ground rules (recomputed per edit, not per frame).
  const standing = useMemo(() => (model && truck ? truckStanding(doc, model) : null), [doc, model, truck]);
  const missing = !truck ? 'Place the truck first.' : !hasLoad ? 'Place the load first.' : !profile ? 'This truck profile is not available here.' : null;

  const apply = (p: Proposal) => {
    // A normal edit: one undo step, saved as a new revision like any other change.
    editor.run((d) => ({ document: { ...p.document, usableArea: d.usableArea }, capture: 'commit' }));
    reset();
  };

  return (
    <section aria-label="Placement search" className="space-y-3" data-testid="advisor-panel">
      <div>
        <h2 className="text-base font-semibold">Placement search</h2>
        <p className="text-sm text-ink-muted">
          Tries where the truck stands, its heading and each leg&apos;s extension, and proposes the three placements with the most margin left over the
          whole swing, pick to set, inside the ground you mark.
        </p>
      </div>

      <div className="rounded-md border border-paper-line p-2">
        <p className="text-sm">
          <span className="font-semibold">Usable ground: </span>
          {draft.drawing ? `${draft.points.length} corners so far` : doc.usableArea ? `marked (${doc.usableArea.length} corners)` : 'not marked (anywhere clear of obstacles)'}
        </p>
        {!readOnly && (
          <div className="mt-2 flex flex-wrap gap-2">
            {draft.drawing ? (
              <>
                <button type="button" className={`${btn} bg-teal text-white`} disabled={draft.points.length < 3} onClick={() => finishUsableArea(editor)}>
                  Done
                </button>
                <button type="button" className={`${btn} border border-paper-line`} onClick={() => draft.set({ drawing: false, points: [] })}>
                  Stop marking
                </button>
              </>
            ) : (
              <>
                <button type="button" className={`${btn} border border-teal text-teal`} onClick={() => draft.set({ drawing: true, points: [] })} data-testid="mark-usable-area">
                  {doc.usableArea ? 'Mark again' : 'Mark usable ground'}
                </button>
                {doc.usableArea && (
                  <button type="button" className={`${btn} border border-paper-line`} onClick={() => clearUsableArea(editor)}>
                    Clear
                  </button>
                )}
              </>
            )}
          </div>
        )}
      </div>

      {standing && standing.status !== 'clear' && <StandingWarning standing={standing} />}

      {run.status === 'running' ? (
        <div className="space-y-2" data-testid="advisor-progress">
          <p className="text-sm">{PHASE[run.phase]}…</p>
          <div className="h-2 overflow-hidden rounded bg-paper-sunk" role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(run.fraction * 100)}>
            <div className="h-full bg-teal transition-[width]" style={{ width: `${Math.round(run.fraction * 100)}%` }} />
          </div>
          <button type="button" className={`${btn} border border-paper-line`} onClick={cancel}>
            Cancel
          </button>
        </div>
      ) : (
        <div>
          <button type="button" className={`${btn} w-full bg-teal text-white`} disabled={!!missing || draft.drawing} onClick={() => profile && start(doc, profile)} data-testid="advisor-start">
            {run.status === 'done' ? 'Search again' : 'Search placements'}
          </button>
          {missing && <p className="mt-1 text-sm text-ink-muted">{missing}</p>}
          {run.status === 'cancelled' && <p className="mt-1 text-sm text-ink-muted">Search cancelled; the plan is unchanged.</p>}
          {run.status === 'error' && <p className="mt-1 text-sm text-red-800">{run.message}</p>}
        </div>
      )}

      {run.status === 'done' && <Results proposals={run.result.proposals} start={run.result.start} elapsed={run.result.elapsedMs} units={units} readOnly={readOnly} onApply={apply} />}
    </section>
  );
}

const partWords = (parts: string[]) => parts.map((p) => (p === 'body' ? 'the body' : `pad ${p}`)).join(', ');

/** The truck as drawn does not stand where the search may place it: said before and after a search. */
function StandingWarning({ standing }: { standing: Standing }) {
  return (
    <p role="status" className="rounded-md border border-red-800 bg-red-50 p-2 text-sm text-red-900" data-testid="advisor-standing-warning">
      <span className="font-semibold">Check the truck as drawn: </span>
      {standing.status === 'outside'
        ? `${partWords(standing.parts)} ${standing.parts.length > 1 ? 'stand' : 'stands'} outside the usable ground. The search only proposes placements inside it, and does not rank this one.`
        : `${partWords(standing.parts)} ${standing.parts.length > 1 ? 'overlap' : 'overlaps'} ${standing.blockers.join(', ') || 'something on the ground'}. The search does not rank this placement.`}
    </p>
  );
}

function Results(props: { proposals: Proposal[]; start: { leastMargin: Proposal['leastMargin'] } | null; elapsed: number; units: UnitSystem; readOnly: boolean; onApply: (p: Proposal) => void }) {
  const { proposals, start, units } = props;
  return (
    <div className="space-y-3" data-testid="advisor-results">
      <p className="text-sm text-ink-muted">
        {start ? `This plan as drawn: ${marginWords(start.leastMargin)}. ` : ''}Searched in {(props.elapsed / 1000).toFixed(1)} s.
      </p>
      {proposals.length === 0 && <p className="text-sm">No placement could stand inside the marked ground within reach of both points.</p>}
      {noneBetter(proposals, start) && (
        <p role="status" className="rounded-md border border-amber-700 bg-amber-50 p-2 text-sm" data-testid="advisor-none-better">
          <span className="font-semibold">No placement found beats the plan as drawn</span> ({marginWords(start!.leastMargin)}). Keep it, or mark more usable ground
          to search wider.
        </p>
      )}
      {proposals.map((p) => (
        <article key={p.rank} className="rounded-md border border-paper-line p-2" data-testid="advisor-proposal">
          <h3 className="text-sm font-semibold">
            {p.rank}. {p.current ? 'The placement as drawn' : `Slew axis ${formatLength(p.truck.x, units)} E, ${formatLength(p.truck.y, units)} N, heading ${formatAngle(p.truck.heading)}`}
          </h3>
          <p className="text-sm">{marginWords(p.leastMargin)}</p>
          <p className="text-xs text-ink-muted">
            Legs {p.legs.map((l) => `${l.id} ${l.stage === 'as set' ? formatLength(l.extension, units) : l.stage}`).join(', ')} · boom {formatLength(p.boom.length, units)} at{' '}
            {formatAngle(p.boom.elevation)} · slew {formatAngle(p.swing.from)} to {formatAngle(p.swing.to)}
          </p>
          <div className="mt-2 grid gap-2 sm:grid-cols-[1fr_auto]">
            <ProposalFigures figures={p.figures} units={units} />
            <CautionNote compact className="sm:max-w-[11rem]" />
          </div>
          {!props.readOnly && !p.current && (
            <button type="button" className={`${btn} mt-2 w-full border border-teal text-teal`} onClick={() => props.onApply(p)} data-testid="advisor-apply">
              Apply as a new revision
            </button>
          )}
        </article>
      ))}
    </div>
  );
}
