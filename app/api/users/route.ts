import { getDb } from '@/db';
import { isUniqueViolation } from '@/db/dialect';
import { inTransaction } from '@/db/transaction';
import { recordAudit } from '@/db/repositories/audit';
import { createUser, findUserByEmail, listUsers } from '@/db/repositories/users';
import { hashPassword } from '@/lib/auth/password';
import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { createUserSchema } from '@/lib/validations/users';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

// Only this organisation's accounts count: an address may also be in use elsewhere, and saying so would
// tell one organisation's admin about another's people.
const emailTaken = () => new HttpError(409, 'email: an account in your organisation already has this e-mail', [{ path: 'email', message: 'Already in use in your organisation' }]);

export const GET = route({ roles: rolesFor('manageUsers') }, async ({ user }) => {
  return { items: await listUsers(getDb(), user.organisationId) };
});

export const POST = route({ roles: rolesFor('manageUsers'), body: createUserSchema }, async ({ user, body }) => {
  // Hash first: bcrypt takes tens of milliseconds and must not hold the write transaction open.
  const passwordHash = await hashPassword(body.password);
  try {
    const created = await inTransaction(getDb(), async (trx) => {
      if (await findUserByEmail(trx, body.email, user.organisationId)) throw emailTaken();
      const row = await createUser(trx, {
        organisation_id: user.organisationId,
        email: body.email,
        name: body.name,
        role: body.role,
        password_hash: passwordHash,
      });
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'user.create', detail: { id: row.id, role: row.role } });
      return row;
    });
    return Response.json(created, { status: 201 });
  } catch (err) {
    // Another request may take the address between the check and the insert; the unique index decides.
    if (isUniqueViolation(err, 'users')) throw emailTaken();
    throw err;
  }
});
