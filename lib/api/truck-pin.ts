import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { findEquipmentProfile } from '@/db/repositories/equipment';
import { HttpError } from './errors';

/**
 * The version of a truck profile a scene is pinned to. Another organisation's profile answers the same as
 * an unknown one. A retired truck cannot be picked for a plan, though a scene already on it may keep it.
 */
export async function pinnedProfileVersion(
  db: Kysely<Database>,
  organisationId: number,
  profileId: number,
  opts: { allowRetired?: boolean } = {},
): Promise<number> {
  const profile = await findEquipmentProfile(db, organisationId, profileId);
  if (!profile) {
    throw new HttpError(400, 'equipmentProfileId: no such truck profile in your organisation', [{ path: 'equipmentProfileId', message: 'Unknown profile' }]);
  }
  if (profile.retiredAt && !opts.allowRetired) {
    throw new HttpError(400, 'equipmentProfileId: this truck profile is retired; pick one in service', [{ path: 'equipmentProfileId', message: 'Retired profile' }]);
  }
  return profile.version;
}
