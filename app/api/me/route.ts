import { getDb } from '@/db';
import { setUserUnits } from '@/db/repositories/users';
import { route } from '@/lib/api/route';
import { updateMeSchema } from '@/lib/validations/users';

export const runtime = 'nodejs';

export const GET = route({}, async ({ user }) => user);

export const PATCH = route({ body: updateMeSchema }, async ({ user, body }) => {
  await setUserUnits(getDb(), user.id, body.units);
  return { ...user, units: body.units };
});
