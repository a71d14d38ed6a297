'use client';
import { useState } from 'react';
import { formatLength } from '@/lib/format/quantity';
import type { UnitSystem } from '@/lib/units';
import { Notice } from '@/components/ui/notice';
import { CommentThread } from './comment-thread';
import type { Anchor, Comments } from './use-comments';
import type { PinPick } from './pin-layer';
import { useLeaveGuard } from '@/components/use-leave-guard';

export type Draft = { pick: PinPick | null; attach: 'point' | 'object' } | null;

/** The comment list beside the plan: open threads first, a form for a new comment (pinned or not). */
export function CommentPanel({ comments, names, units, canWrite, draft, setDraft, placing, setPlacing, selected, onSelect }: {
  comments: Comments;
  names: Record<string, string>;
  units: UnitSystem;
  canWrite: boolean;
  draft: Draft;
  setDraft: (d: Draft) => void;
  placing: boolean;
  setPlacing: (on: boolean) => void;
  selected: number | null;
  onSelect: (id: number) => void;
}) {
  const [text, setText] = useState('');
  const [showResolved, setShowResolved] = useState(false);
  useLeaveGuard(text.trim() !== '');
  const open = comments.threads.filter((t) => !t.resolved);
  const where = (a: Anchor | null) =>
    !a ? 'General comment' : 'objectId' in a ? `On ${names[a.objectId] ?? 'an object no longer on the plan'}` : `Pinned at ${formatLength(a.x, units)} E, ${formatLength(a.y, units)} N`;
  const anchor = (): Anchor | null => (!draft?.pick ? null : draft.attach === 'object' && draft.pick.objectId ? { objectId: draft.pick.objectId } : draft.pick.point);
  const number = new Map(comments.threads.map((t, i) => [t.id, i + 1]));
  const shown = [...open, ...(showResolved ? comments.threads.filter((t) => t.resolved) : [])];
  return (
    <section aria-label="Comments" className="flex flex-col gap-3" data-testid="comment-panel">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-heading font-bold">
          Comments <span className="font-normal text-ink-soft">({open.length} open)</span>
        </h2>
        {canWrite && !draft && (
          <div className="flex flex-wrap gap-2">
            <button type="button" aria-pressed={placing} onClick={() => setPlacing(!placing)} className="min-h-touch rounded-plate border-2 border-ink bg-signal px-3 text-body font-semibold" data-testid="pin-comment">
              {placing ? 'Tap the plan…' : 'Pin a comment'}
            </button>
            <button type="button" onClick={() => setDraft({ pick: null, attach: 'point' })} className="min-h-touch rounded-plate border-2 border-ink bg-paper-raised px-3 text-body font-semibold">
              General comment
            </button>
          </div>
        )}
      </div>
      {placing && <p className="text-caption text-ink-soft">Tap the spot on the plan the comment is about. Tap “Tap the plan…” again to stop.</p>}
      {draft && (
        <form
          className="flex flex-col gap-2 rounded-plate border-2 border-teal bg-paper-raised p-3"
          data-testid="new-comment"
          onSubmit={async (e) => {
            e.preventDefault();
            if (!text.trim()) return;
            if (await comments.post(text, anchor())) {
              setText('');
              setDraft(null);
            }
          }}
        >
          <p className="text-caption font-semibold">{draft.pick ? where(draft.pick.point) : 'General comment (not pinned)'}</p>
          {draft.pick?.objectId && (
            <fieldset className="flex flex-wrap gap-3 text-body">
              <legend className="sr-only">Attach the comment to</legend>
              <label className="flex min-h-touch items-center gap-2">
                <input type="radio" name="attach" checked={draft.attach === 'point'} onChange={() => setDraft({ ...draft, attach: 'point' })} /> this point
              </label>
              <label className="flex min-h-touch items-center gap-2">
                <input type="radio" name="attach" checked={draft.attach === 'object'} onChange={() => setDraft({ ...draft, attach: 'object' })} /> {names[draft.pick.objectId] ?? 'the object here'}
              </label>
            </fieldset>
          )}
          <label className="flex flex-col gap-1 text-caption font-semibold">
            Comment
            <textarea autoFocus value={text} onChange={(e) => setText(e.target.value)} maxLength={4000} rows={3} className="rounded-plate border-2 border-paper-edge bg-paper-raised p-2 text-body font-normal" data-testid="comment-text" />
          </label>
          <div className="flex gap-2">
            <button type="submit" disabled={comments.busy || !text.trim()} className="min-h-touch rounded-plate border-2 border-ink bg-ink px-4 text-body font-semibold text-paper-raised disabled:opacity-50" data-testid="post-comment">
              Post comment
            </button>
            <button type="button" onClick={() => { setDraft(null); setText(''); }} className="min-h-touch rounded-plate px-3 text-body font-semibold text-teal-dark">
              Cancel
            </button>
          </div>
        </form>
      )}
      {comments.error && <Notice tone="error">{comments.error}</Notice>}
      {shown.length ? (
        <ol className="flex flex-col gap-2" data-testid="comment-list">
          {shown.map((t) => (
            <CommentThread key={t.id} thread={t} number={number.get(t.id) ?? 0} where={where(t.anchor)} comments={comments} canWrite={canWrite} selected={selected === t.id} onSelect={() => onSelect(t.id)} />
          ))}
        </ol>
      ) : (
        <p className="text-body text-ink-muted">No open comments.</p>
      )}
      {comments.threads.length > open.length && (
        <button type="button" onClick={() => setShowResolved(!showResolved)} className="self-start text-body font-semibold text-teal-dark underline underline-offset-4">
          {showResolved ? 'Hide' : 'Show'} {comments.threads.length - open.length} resolved
        </button>
      )}
    </section>
  );
}
