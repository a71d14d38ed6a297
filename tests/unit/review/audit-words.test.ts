import { describe, expect, it } from 'vitest';
import { describeReviewAudit } from '@/lib/review/audit-words';

/** The details page's timeline words for review-desk audit entries (lib/server/review and comments record them). */
describe('describeReviewAudit', () => {
  it('says each transition with its revision, and quotes what the decider wrote', () => {
    expect(describeReviewAudit('scene.submit', { revision: 4, submissionId: 2 })).toEqual({ text: 'Submitted revision 4 for review', tone: 'submit', quotes: [] });
    expect(describeReviewAudit('scene.return', { revision: 4, note: 'Add mats' })).toEqual({ text: 'Returned revision 4 with changes requested', tone: 'return', quotes: [{ label: 'Note', text: 'Add mats' }] });
    const approve = describeReviewAudit('scene.approve', { revision: 5, conditions: 'Spotter at the pole', reason: null, note: null })!;
    expect(approve.text).toBe('Approved revision 5');
    expect(approve.quotes).toEqual([{ label: 'Conditions', text: 'Spotter at the pole' }]);
    expect(describeReviewAudit('scene.withdraw', { revision: 3 })?.text).toBe('Withdrew revision 3 from review');
    expect(describeReviewAudit('scene.new-revision', { approvedRevision: 5, revision: 6 })?.text).toBe('Started a new draft revision (6) after the approved revision 5');
  });
  it('tells a pinned comment from a general one, and names replies, resolves and reopens', () => {
    expect(describeReviewAudit('comment.create', { revision: 2, pinned: true })?.text).toBe('Pinned a comment on revision 2');
    expect(describeReviewAudit('comment.create', { revision: 2, pinned: false })?.text).toBe('Commented on revision 2');
    expect(['comment.reply', 'comment.resolve', 'comment.reopen'].map((a) => describeReviewAudit(a, {})?.text)).toEqual(['Replied to a comment', 'Resolved a comment', 'Reopened a comment']);
  });
  it('leaves other actions to the general words', () => {
    expect(describeReviewAudit('scene.update', { revision: 2 })).toBeNull();
    expect(describeReviewAudit('scene.approve', null)?.quotes).toEqual([]);
  });
});
