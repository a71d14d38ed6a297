import { getDb } from '@/db';
import { findProfileVersion } from '@/db/repositories/equipment';
import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { versionParams } from '@/lib/validations/equipment';

export const runtime = 'nodejs';

/** The exact version a scene was planned with, so a later edit cannot silently change an approved plan. */
export const GET = route({ params: versionParams }, async ({ user, params }) => {
  const v = await findProfileVersion(getDb(), user.organisationId, params.id, params.version);
  if (!v) throw new HttpError(404, 'Equipment profile version not found');
  return v;
});
