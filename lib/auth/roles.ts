import type { CurrentUser, Role } from '@/lib/domain';

export class AccessError extends Error {
  constructor(
    readonly status: 401 | 403,
    message: string,
  ) {
    super(message);
  }
}

/** Throws 401 with no user and 403 when the user's role is not among `roles` (any role when omitted). */
export function assertRole(user: CurrentUser | null, roles?: readonly Role[]): CurrentUser {
  if (!user) throw new AccessError(401, 'Sign in to continue');
  if (roles && !roles.includes(user.role)) {
    throw new AccessError(403, `This needs the ${roles.join(' or ')} role; you are signed in as ${user.role}`);
  }
  return user;
}

/** Operators edit their own scenes; admins may delete scenes but not edit them (PUT /api/scenes/[id] agrees). */
export const canEditScenes = (role: Role) => role === 'operator';
export const canReadAllScenes = (role: Role) => role !== 'operator';

/** Operators and admins manage rigging and record inspections; everyone in the organisation reads. */
export const RIGGING_WRITERS = ['operator', 'admin'] as const satisfies readonly Role[];
export const canManageRigging = (role: Role) => (RIGGING_WRITERS as readonly Role[]).includes(role);

/** Trainers and admins build and edit lessons; everyone in the organisation reads them. */
export const LESSON_WRITERS = ['trainer', 'admin'] as const satisfies readonly Role[];
export const canWriteLessons = (role: Role) => (LESSON_WRITERS as readonly Role[]).includes(role);
