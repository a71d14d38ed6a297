/**
 * The review desk's audit entries in plain words (the scene details timeline). Pure: the action and its
 * recorded detail in; null for actions that are not the review desk's.
 */
export type AuditTone = 'submit' | 'approve' | 'return' | 'comment' | 'other';

export interface ReviewAuditWords {
  text: string;
  tone: AuditTone;
  /** Text a person wrote with it (a note, conditions, a reason), quoted under the line. */
  quotes: { label: string; text: string }[];
}

const str = (v: unknown) => (typeof v === 'string' && v.trim() !== '' ? v : null);
const rev = (d: Record<string, unknown>) => (typeof d.revision === 'number' ? ` revision ${d.revision}` : '');

export function describeReviewAudit(action: string, detail: Record<string, unknown> | null): ReviewAuditWords | null {
  const d = detail ?? {};
  const quotes = (pairs: [string, unknown][]) => pairs.flatMap(([label, v]) => (str(v) ? [{ label, text: str(v)! }] : []));
  switch (action) {
    case 'scene.submit':
      return { text: `Submitted${rev(d)} for review`, tone: 'submit', quotes: [] };
    case 'scene.withdraw':
      return { text: `Withdrew${rev(d)} from review`, tone: 'other', quotes: [] };
    case 'scene.approve':
      return { text: `Approved${rev(d)}`, tone: 'approve', quotes: quotes([['Conditions', d.conditions], ['Reason for approval beyond the plan’s own limits', d.reason]]) };
    case 'scene.return':
      return { text: `Returned${rev(d)} with changes requested`, tone: 'return', quotes: quotes([['Note', d.note]]) };
    case 'scene.new-revision':
      return { text: `Started a new draft revision${typeof d.revision === 'number' ? ` (${d.revision})` : ''} after the approved revision ${d.approvedRevision ?? '?'}`, tone: 'other', quotes: [] };
    case 'comment.create':
      return { text: `${d.pinned ? 'Pinned a comment on' : 'Commented on'}${rev(d) || ' the plan'}`, tone: 'comment', quotes: [] };
    case 'comment.reply':
      return { text: 'Replied to a comment', tone: 'comment', quotes: [] };
    case 'comment.resolve':
      return { text: 'Resolved a comment', tone: 'comment', quotes: [] };
    case 'comment.reopen':
      return { text: 'Reopened a comment', tone: 'comment', quotes: [] };
    default:
      return null;
  }
}
