import { getDb } from '@/db';
import { publicRoute } from '@/lib/api/route';
import { completeResetSchema } from '@/lib/validations/users';
import { completePasswordReset } from '@/lib/server/password-reset';

export const runtime = 'nodejs';

/**
 * Sets a new password from an e-mailed reset link. No session: the one-time token is the proof, and it
 * works once, before it expires, for an active account.
 */
export const POST = publicRoute({ body: completeResetSchema }, async ({ body }) => {
  return completePasswordReset(getDb(), body.token, body.newPassword);
});
