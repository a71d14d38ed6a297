'use client';
import { LocalTime } from '@/components/local-time';
import type { SubmissionView } from '@/lib/review/page-data';

const STATE_WORDS: Record<SubmissionView['state'], string> = { pending: 'Awaiting a decision', approved: 'Approved', returned: 'Returned with changes', withdrawn: 'Withdrawn by the operator' };

function Quote({ label, text }: { label: string; text: string | null }) {
  if (!text) return null;
  return (
    <p className="mt-1 text-body">
      <span className="font-semibold">{label}:</span> <span className="whitespace-pre-wrap break-words">{text}</span>
    </p>
  );
}

/** The decision on the plan's submissions, newest first, when this user has nothing to decide here. */
export function DecisionRecord({ submission, history, refusal }: { submission: SubmissionView | null; history: SubmissionView[]; refusal: string | null }) {
  return (
    <section aria-label="Decisions" className="flex flex-col gap-3" data-testid="decision-record">
      <h2 className="text-heading font-bold">Decisions</h2>
      {submission?.state === 'pending' && refusal && <p className="text-body text-ink-soft">{refusal}.</p>}
      {history.length === 0 && <p className="text-body">This plan has not been submitted for review.</p>}
      <ol className="flex flex-col gap-2">
        {history.map((s) => (
          <li key={s.id} className="rounded-plate border border-paper-line bg-paper-raised p-3">
            <p className="font-bold">
              Revision {s.revision}: {STATE_WORDS[s.state]}
            </p>
            <p className="text-caption text-ink-soft">
              Submitted by {s.submittedByName}, <LocalTime iso={s.submittedAt} />
              {s.decidedByName && s.decidedAt && (
                <>
                  {' '}
                  · decided by {s.decidedByName}, <LocalTime iso={s.decidedAt} />
                </>
              )}
            </p>
            <Quote label="Note" text={s.note} />
            <Quote label="Conditions" text={s.conditions} />
            <Quote label="Reason for approval beyond the plan’s own limits" text={s.reason} />
          </li>
        ))}
      </ol>
    </section>
  );
}
