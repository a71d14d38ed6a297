import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { LocalTime } from '@/components/local-time';
import { cx } from '@/components/ui/cx';
import { describeAudit } from '@/components/scenes/audit-words';
import { describeReviewAudit, type AuditTone } from '@/lib/review/audit-words';

export interface AuditRow {
  id: number;
  action: string;
  detail: Record<string, unknown> | null;
  created_at: string;
  user_name: string;
}

// Each kind of event has its own mark and word, so the timeline reads without colour too.
const DOT: Record<AuditTone, string> = {
  submit: 'border-signal-dark bg-signal',
  approve: 'border-within bg-within',
  return: 'border-over bg-over',
  comment: 'border-teal bg-paper-raised',
  other: 'border-ink-muted bg-paper-sunk',
};

/** The scene's audit log as a timeline, newest first: saves, submissions, decisions with their notes, comments. */
export function AuditTimeline({ audit }: { audit: AuditRow[] }) {
  const rows = [...audit].sort((a, b) => (a.created_at === b.created_at ? b.id - a.id : a.created_at < b.created_at ? 1 : -1));
  return (
    <Card>
      <CardHeader title="Activity" description="Who did what to this scene, newest first: saves, review decisions and comments" />
      {rows.length === 0 ? (
        <CardBody>
          <p className="text-body text-ink-muted">No activity recorded yet.</p>
        </CardBody>
      ) : (
        <ol className="relative mx-5 my-4 border-l-2 border-paper-line" data-testid="scene-audit">
          {rows.map((a) => {
            const review = describeReviewAudit(a.action, a.detail);
            return (
              <li key={a.id} className="relative pb-4 pl-5 last:pb-0" data-action={a.action}>
                <span aria-hidden className={cx('absolute -left-[7px] top-1.5 h-3 w-3 rounded-full border-2', DOT[review?.tone ?? 'other'])} />
                <p className="font-medium">
                  <span className="font-bold">{a.user_name}</span> — {review?.text ?? describeAudit(a.action, a.detail)}
                </p>
                {review?.quotes.map((q) => (
                  <p key={q.label} className="mt-0.5 text-body text-ink-soft">
                    <span className="font-semibold">{q.label}:</span> <span className="whitespace-pre-wrap break-words">{q.text}</span>
                  </p>
                ))}
                <p className="text-caption text-ink-muted">
                  <LocalTime iso={a.created_at} />
                </p>
              </li>
            );
          })}
        </ol>
      )}
    </Card>
  );
}
