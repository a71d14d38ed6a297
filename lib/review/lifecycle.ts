/**
 * The plan's review lifecycle, as a pure table: draft → submitted → approved or returned. A returned plan
 * goes back to draft when it is edited (or may be resubmitted as it stands, after answering comments); the
 * operator may withdraw a submitted plan; an approved plan is frozen until someone starts a new revision,
 * which is a draft with no approval. Who may fire an event is decided by ./permissions, not here.
 */
import { SCENE_STATUSES, type SceneStatus } from '@/lib/domain';

export const PLAN_STATUSES = SCENE_STATUSES;
export type PlanStatus = SceneStatus;

export const PLAN_EVENTS = ['edit', 'submit', 'withdraw', 'approve', 'return', 'new-revision'] as const;
export type PlanEvent = (typeof PLAN_EVENTS)[number];

const TABLE: Record<PlanStatus, Partial<Record<PlanEvent, PlanStatus>>> = {
  draft: { edit: 'draft', submit: 'submitted' },
  submitted: { withdraw: 'draft', approve: 'approved', return: 'returned' },
  approved: { 'new-revision': 'draft' },
  returned: { edit: 'draft', submit: 'submitted' },
  archived: {},
};

/** What to tell someone who tries an event the plan's status does not allow (the 409 message). */
const REFUSAL: Record<PlanStatus, string> = {
  draft: 'This plan is a draft: it has not been submitted for review.',
  submitted: 'This plan is awaiting review, so it is frozen. Withdraw it to edit it, or wait for the decision.',
  approved: 'This plan is approved, so it is frozen. Start a new revision to change it; the approved revision stays as it is.',
  returned: 'This plan was returned with changes requested. Edit it or resubmit it.',
  archived: 'This plan is archived and cannot change.',
};

export type Transition = { ok: true; to: PlanStatus } | { ok: false; message: string };

export function transition(from: PlanStatus, event: PlanEvent): Transition {
  const to = TABLE[from][event];
  return to ? { ok: true, to } : { ok: false, message: REFUSAL[from] };
}

/** Statuses in which the operator may save edits to the sketch. */
export const isEditable = (s: PlanStatus) => transition(s, 'edit').ok;
