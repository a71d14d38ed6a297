'use client';
import { useState } from 'react';
import { useRouter } from 'next/navigation';
import type { LimitBreach, PlanFigures } from '@/lib/review/figures';
import { formatBreach } from '@/lib/review/format';
import type { UnitSystem } from '@/lib/units';
import { Notice } from '@/components/ui/notice';
import { errorText, sendJson } from '@/components/review/post-json';
import { useLeaveGuard } from '@/components/use-leave-guard';

const area = 'rounded-plate border-2 border-paper-edge bg-paper-raised p-2 text-body font-normal';

/**
 * Approve (conditions optional; a written reason when the plan is beyond its own stricter limits) or return
 * (a note, or an open comment). A hard limit refuses approval on the server (422): its checks are shown
 * in words, in the viewer's units.
 */
export function DecisionForm({ sceneId, revision, figures, openComments, units }: { sceneId: number; revision: number; figures: PlanFigures | null; openComments: number; units: UnitSystem }) {
  const router = useRouter();
  const [conditions, setConditions] = useState('');
  const [reason, setReason] = useState('');
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  useLeaveGuard(!busy && (conditions.trim() !== '' || reason.trim() !== '' || note.trim() !== ''));
  const [error, setError] = useState<string | null>(null);
  const [refused, setRefused] = useState<LimitBreach[] | null>(null);
  const beyondPlan = (figures?.beyondPlan.length ?? 0) > 0;
  const hard = figures?.hardLimits ?? [];

  const decide = async (decision: 'approve' | 'return') => {
    setBusy(true);
    setError(null);
    setRefused(null);
    const body = decision === 'approve' ? { decision, revision, conditions: conditions || undefined, reason: reason || undefined } : { decision, revision, note: note || undefined };
    const r = await sendJson('POST', `/api/scenes/${sceneId}/decision`, body);
    setBusy(false);
    if (r.ok) {
      // Decided: nothing left unsaved, so leaving no longer asks.
      setConditions('');
      setReason('');
      setNote('');
      return router.refresh();
    }
    if (r.status === 422 && Array.isArray(r.json.checks) && (r.json.checks as unknown[]).length && !/reason/.test(String(r.json.error))) setRefused(r.json.checks as LimitBreach[]);
    else setError(errorText(r.json));
  };

  return (
    <section aria-label="Decision" className="flex flex-col gap-4" data-testid="decision-form">
      <h2 className="text-heading font-bold">Decision on revision {revision}</h2>
      {hard.length > 0 && (
        <Notice tone="warning" title="Beyond a hard limit: approval will be refused">
          <ul className="list-disc pl-5">
            {hard.map((b) => (
              <li key={b.id}>{formatBreach(b, units)}</li>
            ))}
          </ul>
          <p className="mt-1">Return it with a note on what has to change.</p>
        </Notice>
      )}
      <div className="flex flex-col gap-2 rounded-plate border-2 border-within/60 bg-paper-raised p-3">
        <label className="flex flex-col gap-1 text-caption font-semibold">
          Conditions (optional)
          <textarea value={conditions} onChange={(e) => setConditions(e.target.value)} maxLength={4000} rows={2} className={area} placeholder="e.g. two more mats under the right rear pad" data-testid="conditions" />
        </label>
        {beyondPlan && (
          <label className="flex flex-col gap-1 text-caption font-semibold">
            Reason for approving beyond the plan’s own limits (required)
            <textarea value={reason} onChange={(e) => setReason(e.target.value)} maxLength={4000} rows={2} className={area} data-testid="reason" />
          </label>
        )}
        <button type="button" disabled={busy || (beyondPlan && !reason.trim())} onClick={() => decide('approve')} className="min-h-touch self-start rounded-plate border-2 border-ink bg-within px-4 text-body font-bold text-paper-raised disabled:opacity-50" data-testid="approve">
          Approve revision {revision}
        </button>
      </div>
      <div className="flex flex-col gap-2 rounded-plate border-2 border-over/60 bg-paper-raised p-3">
        <label className="flex flex-col gap-1 text-caption font-semibold">
          Note to the operator {openComments ? `(optional: ${openComments} open ${openComments === 1 ? 'comment says' : 'comments say'} what to change)` : '(required: say what to change)'}
          <textarea value={note} onChange={(e) => setNote(e.target.value)} maxLength={4000} rows={2} className={area} data-testid="return-note" />
        </label>
        <button type="button" disabled={busy || (!openComments && !note.trim())} onClick={() => decide('return')} className="min-h-touch self-start rounded-plate border-2 border-over bg-paper-raised px-4 text-body font-bold text-over disabled:opacity-50" data-testid="return">
          Return with changes
        </button>
      </div>
      {refused && (
        <Notice tone="error" title="Approval refused: a figure is beyond a hard limit">
          <ul className="list-disc pl-5" data-testid="refused-checks">
            {refused.map((b) => (
              <li key={b.id}>{formatBreach(b, units)}</li>
            ))}
          </ul>
        </Notice>
      )}
      {error && <Notice tone="error">{error}</Notice>}
    </section>
  );
}
