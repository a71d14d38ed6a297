import { getDb } from '@/db';
import { idParams, route } from '@/lib/api/route';
import { rolesFor } from '@/lib/auth/permissions';
import { sendPasswordReset } from '@/lib/server/password-reset';

export const runtime = 'nodejs';

/** An admin e-mails a user a one-time link to set a new password (lib/server/password-reset.ts). */
export const POST = route({ roles: rolesFor('manageUsers'), params: idParams }, async ({ user, params }) => {
  return Response.json(await sendPasswordReset(getDb(), user, params.id), { status: 202 });
});
