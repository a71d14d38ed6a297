import { getDb } from '@/db';
import { authOptions } from '@/lib/auth/options';

type Authorize = (credentials: Record<string, unknown> | undefined, req: unknown) => Promise<unknown>;

/** next-auth's credentials check as the sign-in form calls it (the first provider's authorize). */
export const authorize = (authOptions.providers[0] as unknown as { options: { authorize: Authorize } }).options.authorize;

/** A demo user's id from their e-mail. */
export const idOf = async (email: string) => (await getDb().selectFrom('users').select('id').where('email', '=', email).executeTakeFirstOrThrow()).id;
