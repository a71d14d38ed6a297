import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { findEquipmentProfile, findProfileVersion } from '@/db/repositories/equipment';
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

/** The truck object's profile and version in a scene document, when it has a well-formed one. */
export function documentTruckPin(document: unknown): { profileId: number; profileVersion: number } | null {
  const objects = document && typeof document === 'object' ? (document as { objects?: unknown }).objects : undefined;
  if (!Array.isArray(objects)) return null;
  const t = objects.find((o) => !!o && typeof o === 'object' && (o as { kind?: unknown }).kind === 'truck') as { profileId?: unknown; profileVersion?: unknown } | undefined;
  const ok = (n: unknown): n is number => typeof n === 'number' && Number.isInteger(n) && n > 0;
  return t && ok(t.profileId) && ok(t.profileVersion) ? { profileId: t.profileId, profileVersion: t.profileVersion } : null;
}

/**
 * What the scene record says it was planned with, following the sketch: the document's truck profile and
 * the exact version it is drawn from, when that profile is this organisation's and the version exists.
 * Null when the document says nothing usable (no truck, or a truck from elsewhere): leave the record be.
 */
export async function pinFromDocument(db: Kysely<Database>, organisationId: number, document: unknown): Promise<{ equipmentProfileId: number; equipmentProfileVersion: number } | null> {
  const pin = documentTruckPin(document);
  if (!pin) return null;
  const v = await findProfileVersion(db, organisationId, pin.profileId, pin.profileVersion);
  return v ? { equipmentProfileId: pin.profileId, equipmentProfileVersion: pin.profileVersion } : null;
}
