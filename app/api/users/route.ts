import { getDb } from '@/db';
import { createUser, findUserByEmail, listUsers } from '@/db/repositories/users';
import { hashPassword } from '@/lib/auth/password';
import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { createUserSchema } from '@/lib/validations/users';

export const runtime = 'nodejs';

export const GET = route({ roles: ['admin'] }, async ({ user }) => {
  return { items: await listUsers(getDb(), user.organisationId) };
});

export const POST = route({ roles: ['admin'], body: createUserSchema }, async ({ user, body }) => {
  const db = getDb();
  if (await findUserByEmail(db, body.email)) {
    throw new HttpError(409, 'email: an account with this e-mail already exists', [{ path: 'email', message: 'Already in use' }]);
  }
  const passwordHash = await hashPassword(body.password);
  const created = await createUser(db, {
    organisation_id: user.organisationId,
    email: body.email,
    name: body.name,
    role: body.role,
    password_hash: passwordHash,
  });
  return Response.json(created, { status: 201 });
});
