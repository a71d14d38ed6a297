'use client';
import { useState } from 'react';
import { LocalTime } from '@/components/local-time';
import { cx } from '@/components/ui/cx';
import type { CommentView, Comments, ThreadView } from './use-comments';
import { useLeaveGuard } from '@/components/use-leave-guard';

const ROLE: Record<string, string> = { operator: 'operator', supervisor: 'supervisor', admin: 'admin', trainer: 'trainer' };

function Entry({ c }: { c: CommentView }) {
  return (
    <div>
      <p className="text-caption text-ink-muted">
        <strong className="text-ink">{c.authorName}</strong> ({ROLE[c.authorRole] ?? c.authorRole}) · <LocalTime iso={c.createdAt} /> · revision {c.revision}
      </p>
      {/* Plain text as typed: React escapes it, and line breaks are kept. */}
      <p className="mt-0.5 whitespace-pre-wrap break-words text-body" data-testid="comment-body">
        {c.body}
      </p>
    </div>
  );
}

/** One thread: the first comment with where it is pinned, its replies, a reply box, resolve or reopen. */
export function CommentThread({ thread, number, where, comments, canWrite, selected, onSelect }: {
  thread: ThreadView;
  number: number;
  where: string;
  comments: Comments;
  canWrite: boolean;
  selected: boolean;
  onSelect: () => void;
}) {
  const [reply, setReply] = useState('');
  useLeaveGuard(reply.trim() !== '');
  return (
    <li
      data-testid="comment-thread"
      data-thread={thread.id}
      className={cx('rounded-plate border-2 bg-paper-raised p-3', selected ? 'border-teal' : 'border-paper-line', thread.resolved && 'opacity-75')}
    >
      <button type="button" onClick={onSelect} className="mb-1 flex w-full items-center gap-2 text-left text-caption font-semibold text-teal-dark">
        <span className={cx('inline-flex h-6 min-w-6 items-center justify-center rounded-full border-2 px-1 text-ink', thread.resolved ? 'border-ink-muted bg-paper-sunk' : 'border-ink bg-signal')}>{number}</span>
        <span className="min-w-0 flex-1 truncate">{where}</span>
        <span className={thread.resolved ? 'text-within' : 'text-over'}>{thread.resolved ? `Resolved${thread.resolvedByName ? ` by ${thread.resolvedByName}` : ''}` : 'Open'}</span>
      </button>
      <Entry c={thread} />
      {thread.replies.length > 0 && (
        <ol className="mt-2 flex flex-col gap-2 border-l-2 border-paper-line pl-3">
          {thread.replies.map((r) => (
            <li key={r.id}>
              <Entry c={r} />
            </li>
          ))}
        </ol>
      )}
      {canWrite && (
        <form
          className="mt-2 flex flex-col gap-2"
          onSubmit={async (e) => {
            e.preventDefault();
            if (reply.trim() && (await comments.post(reply, null, thread.id))) setReply('');
          }}
        >
          {!thread.resolved && (
            <label className="flex flex-col gap-1 text-caption font-semibold">
              Reply
              <textarea value={reply} onChange={(e) => setReply(e.target.value)} maxLength={4000} rows={2} className="rounded-plate border-2 border-paper-edge bg-paper-raised p-2 text-body font-normal" data-testid="reply-text" />
            </label>
          )}
          <div className="flex flex-wrap gap-2">
            {!thread.resolved && (
              <button type="submit" disabled={comments.busy || !reply.trim()} className="min-h-touch rounded-plate border-2 border-ink bg-paper-raised px-3 text-body font-semibold disabled:opacity-50">
                Reply
              </button>
            )}
            <button type="button" disabled={comments.busy} onClick={() => comments.setResolved(thread.id, !thread.resolved)} className="min-h-touch rounded-plate border-2 border-transparent px-3 text-body font-semibold text-teal-dark underline-offset-4 hover:underline" data-testid="resolve-toggle">
              {thread.resolved ? 'Reopen' : 'Resolve'}
            </button>
          </div>
        </form>
      )}
    </li>
  );
}
