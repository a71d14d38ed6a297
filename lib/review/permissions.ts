import type { Role } from '@/lib/domain';

/**
 * Who may do what on the review desk. Pure: the user's id and role, the scene's owner. Routes, pages and the
 * UI's enabled states all ask here.
 */
interface Actor {
  id: number;
  role: Role;
}
interface PlanRef {
  ownerId: number;
}

export const REVIEWER_ROLES = ['supervisor', 'admin'] as const satisfies readonly Role[];
export const isReviewer = (role: Role) => (REVIEWER_ROLES as readonly Role[]).includes(role);

/** Submit, withdraw, start a new revision: the operator who wrote the plan. */
export const mayManagePlan = (u: Actor, s: PlanRef) => u.role === 'operator' && s.ownerId === u.id;

/** Approve or return: a supervisor or admin of the organisation, never on a plan they wrote. */
export function decisionRefusal(u: Actor, s: PlanRef): string | null {
  if (!isReviewer(u.role)) return `Only a supervisor or admin decides on a plan; you are signed in as ${u.role}`;
  if (s.ownerId === u.id) return 'Nobody decides on a plan they wrote';
  return null;
}

/** Comment, reply, resolve, reopen: the plan's operator and the organisation's reviewers. */
export const mayComment = (u: Actor, s: PlanRef) => mayManagePlan(u, s) || isReviewer(u.role);
