'use client';
import { useEffect, useMemo, useState } from 'react';
import Link from 'next/link';
import { useEditorContext, useEditorState } from '../editor-context';
import type { EditorReviewData } from '@/lib/review/page-data';
import { StatusPill } from '@/components/ui/badge';
import { errorText, sendJson } from '@/components/review/post-json';
import { PinLayer } from './pin-layer';
import { CommentPanel, type Draft } from './comment-panel';
import { useComments } from './use-comments';

const btn = 'min-h-touch rounded-plate border-2 border-ink px-2.5 text-caption font-semibold disabled:opacity-50';

/** True while the sketch has edits the server has not yet accepted (autosave moves the store's revision). */
function useUnsaved() {
  const { store } = useEditorContext();
  const [saved, setSaved] = useState(() => store.getState().document);
  useEffect(() => store.subscribe((s, prev) => s.revision !== prev.revision && setSaved(s.document)), [store]);
  return useEditorState((s) => s.document) !== saved;
}

/**
 * The review desk inside the editor, laid over the plan: a status strip with the plan's next step (submit,
 * withdraw, resubmit, start a new revision), the open comments as numbered pins, and the comment list in
 * a drawer where the operator replies and resolves.
 */
export function EditorReview({ sceneId, review }: { sceneId: number; review: EditorReviewData }) {
  const { store } = useEditorContext();
  const units = useEditorState((s) => s.units);
  const objects = useEditorState((s) => s.document.objects);
  const analysisNames = useEditorState((s) => (s.analysis?.lift.ok ? s.analysis.lift.names : null));
  const comments = useComments(sceneId, review.threads);
  const [panel, setPanel] = useState(false);
  const [placing, setPlacing] = useState(false);
  const [draft, setDraft] = useState<Draft>(null);
  const [selected, setSelected] = useState<number | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const unsaved = useUnsaved();
  const names = useMemo(() => ({ ...Object.fromEntries(objects.flatMap((o) => (o.label ? [[o.id, o.label]] : []))), ...(analysisNames ?? {}) }), [objects, analysisNames]);
  const open = comments.threads.filter((t) => !t.resolved).length;
  const s = review.status;
  const last = review.lastDecision;

  const act = async (path: 'submit' | 'withdraw' | 'new-revision') => {
    setBusy(true);
    setError(null);
    const r = await sendJson('POST', `/api/scenes/${sceneId}/${path}`, path === 'submit' ? { revision: store.getState().revision } : {});
    if (r.ok) return window.location.reload();
    setBusy(false);
    setError(errorText(r.json));
  };

  // The pill names the state; the words beside it say only who and what follows, to keep the strip one line.
  const message =
    s === 'submitted' ? 'frozen until the decision' :
    s === 'approved' ? `${last?.state === 'approved' && last.byName ? `by ${last.byName} · ` : ''}read-only` :
    s === 'returned' ? (last?.byName ? `by ${last.byName}` : null) :
    open ? 'open comments to answer' : null;

  return (
    <>
      <PinLayer
        threads={comments.threads}
        selected={selected}
        onSelect={(id) => {
          setSelected(id);
          setPanel(true);
        }}
        placing={placing}
        onPick={(pick) => {
          setPlacing(false);
          setDraft({ pick, attach: 'point' });
          setPanel(true);
        }}
        draft={draft?.pick ? (draft.attach === 'object' && draft.pick.objectId ? { objectId: draft.pick.objectId } : draft.pick.point) : null}
        showResolved={false}
      />
      {/* Right of the reach-envelope switch (top left) and left of the north arrow (top right). */}
      <div className="pointer-events-none absolute left-2 right-14 top-14 z-20 flex justify-end md:left-[18rem] md:top-2">
        <div className="pointer-events-auto flex max-w-full flex-wrap items-center gap-x-2 gap-y-1 rounded-plate border-2 border-ink bg-paper-raised/95 px-2 py-0.5 text-caption shadow" data-testid="review-strip">
          <StatusPill status={s} />
          {message && <span className="text-ink-soft">{message}</span>}
          {s === 'returned' && last?.note && <span className="max-w-[16rem] truncate text-ink-soft" title={last.note}>“{last.note}”</span>}
          {s === 'approved' && last?.state === 'approved' && last.conditions && <span className="max-w-[16rem] truncate text-ink-soft" title={last.conditions}>Conditions: {last.conditions}</span>}
          {review.mayManage && (s === 'draft' || s === 'returned') && (
            <button type="button" className={`${btn} bg-signal`} disabled={busy || unsaved} onClick={() => act('submit')} data-testid="submit-plan" title={unsaved ? 'Saving the last change first…' : undefined}>
              {s === 'returned' ? 'Resubmit for review' : 'Submit for review'}
            </button>
          )}
          {review.mayManage && s === 'submitted' && (
            <button type="button" className={`${btn} bg-paper-raised`} disabled={busy} onClick={() => act('withdraw')} data-testid="withdraw-plan">
              Withdraw to edit
            </button>
          )}
          {review.mayManage && s === 'approved' && (
            <button type="button" className={`${btn} bg-signal`} disabled={busy} onClick={() => act('new-revision')} data-testid="new-revision">
              Start a new revision
            </button>
          )}
          <button type="button" className={`${btn} bg-paper-raised`} aria-expanded={panel} onClick={() => setPanel(!panel)} data-testid="toggle-comments">
            Comments ({open})
          </button>
          {review.reviewer && (
            <Link href={`/scenes/${sceneId}/review`} className="inline-flex min-h-touch items-center px-1 font-semibold text-teal-dark underline underline-offset-4">
              Review page
            </Link>
          )}
          {error && (
            <span role="alert" className="basis-full text-body font-semibold text-over">
              {error}
            </span>
          )}
        </div>
      </div>
      {panel && (
        <aside aria-label="Review comments" className="absolute inset-y-0 right-0 z-30 flex w-[min(380px,92vw)] flex-col border-l-2 border-ink bg-paper shadow-xl" data-testid="editor-comments">
          <div className="flex shrink-0 items-center justify-end border-b border-paper-line bg-paper-raised px-2">
            <button type="button" onClick={() => setPanel(false)} className="min-h-touch px-3 text-body font-semibold text-teal-dark">
              Close
            </button>
          </div>
          <div className="min-h-0 flex-1 overflow-y-auto p-3">
            <CommentPanel comments={comments} names={names} units={units} canWrite={review.mayComment} draft={draft} setDraft={setDraft} placing={placing} setPlacing={setPlacing} selected={selected} onSelect={setSelected} />
          </div>
        </aside>
      )}
    </>
  );
}
