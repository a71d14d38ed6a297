import type { CurrentUser } from '@/lib/auth/current-user';

/**
 * Route-handler tests sign in by setting this. Use with
 * vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'))
 */
let current: CurrentUser | null = null;

export function signInAs(user: CurrentUser | null) {
  current = user;
}

export async function getCurrentUser(): Promise<CurrentUser | null> {
  return current;
}
