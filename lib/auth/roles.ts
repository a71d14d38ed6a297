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
