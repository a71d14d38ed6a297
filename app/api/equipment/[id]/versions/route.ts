import { getDb } from '@/db';
import { findEquipmentProfile, listProfileVersions } from '@/db/repositories/equipment';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';

export const runtime = 'nodejs';

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const db = getDb();
  if (!(await findEquipmentProfile(db, user.organisationId, params.id))) throw new HttpError(404, 'Equipment profile not found');
  // The list is for the history view; a single version (with its spec) comes from /versions/[version].
  return { items: await listProfileVersions(db, user.organisationId, params.id) };
});
