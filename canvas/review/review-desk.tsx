'use client';
import { useEffect, useMemo, useState } from 'react';
import Link from 'next/link';
import { useStore } from 'zustand';
import { createEditorStore } from '../store/editor-store';
import { createEditor } from '../editor/create-editor';
import { EditorContext } from '../editor-context';
import { attachLiveAnalysis } from '../analysis/live-analysis';
import { useAutoFit } from '../view/use-auto-fit';
import { ReplayPlan } from '../replay/replay-plan';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';
import type { UnitSystem } from '@/lib/units';
import type { ReviewPageData } from '@/lib/review/page-data';
import { figureChanges, sceneChanges } from '@/lib/review/changes';
import { arcOf } from '@/lib/lift';
import { slewOf, travelOf } from '@/lib/replay/playback-clock';
import { CautionNote } from '@/components/caution-note';
import { StatusPill } from '@/components/ui/badge';
import { LocalTime } from '@/components/local-time';
import { PlanDownloadLink } from '@/components/scenes/plan-download-link';
import { cx } from '@/components/ui/cx';
import { PinLayer } from './pin-layer';
import { CommentPanel, type Draft } from './comment-panel';
import { useComments } from './use-comments';
import { DecisionForm } from './decision-form';
import { ChangesPanel } from './changes-panel';
import { SubmittedFigures } from './submitted-figures';
import { DecisionRecord } from './decision-record';

export type ReviewDeskProps = ReviewPageData & { units: UnitSystem; backTo: { href: string; label: string } };
type Tab = 'results' | 'changes' | 'comments' | 'decision';

const makeCtx = (sceneId: number, doc: SceneDocument, revision: number, units: UnitSystem, profiles: TruckProfileInput[]) => {
  const store = createEditorStore({ sceneId, document: doc, revision, readOnly: true, units, profiles });
  return { store, editor: createEditor(store) };
};

/** The supervisor's review page: the submitted revision drawn read-only by the editor's own shapes, with results, changes, comments and the decision. */
export function ReviewDesk(p: ReviewDeskProps) {
  const [ctx] = useState(() => makeCtx(p.scene.id, p.document, p.revision, p.units, p.profiles));
  const [ghost] = useState(() => (p.previous ? makeCtx(p.scene.id, p.previous.document, p.previous.submission.revision, p.units, p.profiles) : null));
  const [showGhost, setShowGhost] = useState(!!p.previous);
  const comments = useComments(p.scene.id, p.threads);
  const [tab, setTab] = useState<Tab>(p.previous ? 'changes' : 'results');
  const [placing, setPlacing] = useState(false);
  const [draft, setDraft] = useState<Draft>(null);
  const [selected, setSelected] = useState<number | null>(null);
  const analysis = useStore(ctx.store, (s) => s.analysis);
  const slew = useStore(ctx.store, (s) => s.scrubSlew);
  const names = useMemo(() => ({ ...Object.fromEntries(p.document.objects.flatMap((o) => (o.label ? [[o.id, o.label]] : []))), ...(analysis?.lift.ok ? analysis.lift.names : {}) }), [analysis, p.document]);
  const changes = useMemo(() => (p.previous ? { sketch: sceneChanges(p.previous.document, p.document), figures: p.figures ? figureChanges(p.previous.figures, p.figures) : [] } : null), [p.previous, p.document, p.figures]);
  const open = comments.threads.filter((t) => !t.resolved).length;
  const mayDecide = p.decisionRefusal === null && p.submission !== null;

  const fit = useAutoFit(ctx);
  useEffect(() => {
    const detach = attachLiveAnalysis(ctx.store, { deferFull: (run) => setTimeout(run, 0) });
    ctx.store.getState().set({ scrubSlew: arcOf(ctx.store.getState().document.swing).from });
    return detach;
  }, [ctx]);
  // The ghost (the last reviewed revision) follows the view and the slew shown.
  useEffect(() => {
    if (!ghost) return;
    const sync = () => {
      const s = ctx.store.getState();
      ghost.store.setState({ camera: s.camera, viewport: s.viewport, scrubSlew: s.scrubSlew, units: s.units });
    };
    sync();
    return ctx.store.subscribe(sync);
  }, [ghost, ctx]);

  const tabs: { id: Tab; label: string }[] = [
    { id: 'results', label: 'Results' },
    ...(changes ? [{ id: 'changes' as const, label: 'Changes' }] : []),
    { id: 'comments', label: `Comments (${open})` },
    { id: 'decision', label: 'Decision' },
  ];
  const worst = analysis?.result?.worstCase.slew ?? null;
  // The slider travels along the planned swing, pick to set, the way the boom turns.
  const arc = arcOf(p.document.swing);
  const travel = (slew === null ? 0 : travelOf(arc, slew)) ?? 0;

  return (
    <EditorContext.Provider value={ctx}>
      <div className="flex h-full flex-col" data-testid="review-desk">
        <header className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b-2 border-ink bg-paper-raised px-3 py-2">
          <Link href={p.backTo.href} className="inline-flex min-h-touch items-center text-body font-semibold text-teal-dark underline underline-offset-4">
            ← {p.backTo.label}
          </Link>
          {/* On a phone: the back link and the PDF on the first row, the title under them. */}
          <div className="order-last min-w-0 basis-full sm:order-none sm:basis-0 sm:flex-1">
            <h1 className="truncate text-lead font-bold" data-testid="scene-title">
              Review: {p.scene.title}
            </h1>
            <p className="flex flex-wrap items-center gap-x-2 text-caption text-ink-soft">
              <StatusPill status={p.scene.status} />
              <span data-testid="review-revision">Revision {p.revision}</span>
              {p.submission && (
                <span>
                  submitted by {p.submission.submittedByName}, <LocalTime iso={p.submission.submittedAt} />
                </span>
              )}
            </p>
          </div>
          <span className="flex-1 sm:hidden" />
          <PlanDownloadLink sceneId={p.scene.id} revision={p.revision} />
        </header>
        <div className="flex min-h-0 flex-1 flex-col lg:flex-row">
          <div className="relative h-[46%] shrink-0 border-b-2 border-ink lg:h-auto lg:min-w-0 lg:flex-1 lg:border-b-0">
            <ReplayPlan ghost={showGhost ? ghost : null} />
            <PinLayer
              threads={comments.threads}
              selected={selected}
              onSelect={(id) => {
                setSelected(id);
                setTab('comments');
              }}
              placing={placing}
              onPick={(pick) => {
                setPlacing(false);
                setDraft({ pick, attach: 'point' });
                setTab('comments');
              }}
              draft={draft?.pick ? (draft.attach === 'object' && draft.pick.objectId ? { objectId: draft.pick.objectId } : draft.pick.point) : null}
              showResolved={false}
            />
            <div className="absolute bottom-2 left-2 right-2 z-20 flex flex-wrap items-center gap-2 text-caption">
              <label className="flex min-h-touch flex-1 items-center gap-2 rounded-plate border border-paper-line bg-paper-raised/95 px-2 font-semibold">
                Slew {slewOf({ arc, travel }).toFixed(0)}°
                <input type="range" min={0} max={arc.span} step={1} value={travel} onChange={(e) => ctx.store.getState().set({ scrubSlew: slewOf({ arc, travel: Number(e.target.value) }) })} className="min-w-16 flex-1 accent-ink" aria-label="Slew shown, along the swing from pick to set" />
              </label>
              {worst !== null && (
                <button type="button" onClick={() => ctx.store.getState().set({ scrubSlew: worst })} className="min-h-touch rounded-plate border-2 border-ink bg-paper-raised px-2 font-semibold">
                  Worst case
                </button>
              )}
              <button type="button" onClick={fit} className="min-h-touch rounded-plate border-2 border-ink bg-paper-raised px-2 font-semibold">
                Fit
              </button>
              {ghost && (
                <label className="flex min-h-touch items-center gap-1.5 rounded-plate border border-paper-line bg-paper-raised/95 px-2 font-semibold">
                  <input type="checkbox" checked={showGhost} onChange={(e) => setShowGhost(e.target.checked)} /> Rev. {p.previous!.submission.revision} faint
                </label>
              )}
            </div>
          </div>
          <aside className="flex min-h-0 flex-1 flex-col bg-paper lg:w-[420px] lg:flex-none lg:border-l-2 lg:border-ink xl:w-[460px]">
            <div role="tablist" className="flex shrink-0 overflow-x-auto border-b border-paper-line bg-paper-raised">
              {tabs.map((t) => (
                <button key={t.id} role="tab" type="button" aria-selected={tab === t.id} data-testid={`review-tab-${t.id}`} onClick={() => setTab(t.id)} className={cx('min-h-touch flex-1 whitespace-nowrap px-3 text-body font-semibold', tab === t.id ? 'border-b-4 border-signal text-ink' : 'text-ink-muted hover:bg-paper-sunk')}>
                  {t.label}
                </button>
              ))}
            </div>
            <div className="flex min-h-0 flex-1 flex-col gap-4 overflow-y-auto p-3">
              {tab === 'results' && (p.figures ? <SubmittedFigures figures={p.figures} checks={p.checks} units={p.units} engineVersion={p.submission?.engineVersion ?? null} /> : <p className="text-body">{p.problem ?? 'Nothing to compute yet.'}</p>)}
              {tab === 'changes' && changes && p.previous && (
                <ChangesPanel changes={changes.sketch} figures={changes.figures} since={{ revision: p.previous.submission.revision, decision: p.previous.submission.state === 'approved' ? 'approved' : 'returned' }} units={p.units} names={names} />
              )}
              {tab === 'comments' && (
                <CommentPanel comments={comments} names={names} units={p.units} canWrite={p.mayComment} draft={draft} setDraft={setDraft} placing={placing} setPlacing={setPlacing} selected={selected} onSelect={setSelected} />
              )}
              {tab === 'decision' &&
                (mayDecide ? (
                  <DecisionForm sceneId={p.scene.id} revision={p.revision} figures={p.figures} openComments={open} units={p.units} />
                ) : (
                  <DecisionRecord submission={p.submission} history={p.history} refusal={p.decisionRefusal} />
                ))}
              <CautionNote compact className="mt-auto" />
            </div>
          </aside>
        </div>
      </div>
    </EditorContext.Provider>
  );
}
