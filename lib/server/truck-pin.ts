import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { findEquipmentProfile, profileVersionStatus } from '@/db/repositories/equipment';
import { HttpError } from '@/lib/api/errors';

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

export interface ScenePin {
  equipmentProfileId: number | null;
  equipmentProfileVersion: number | null;
}

/**
 * The truck profile and version a scene record names, from a create or save request. The record follows
 * the sketch: the version pinned is the one the sketch's truck is drawn from, when the sketch names that
 * profile and the version exists, else the profile's current version.
 * - an explicit `equipmentProfileId` is checked (this organisation's; in service, unless `keepProfileId`
 *   names it: a scene already on a truck may keep it after the truck is retired);
 * - `null` clears the pin;
 * - no id: the sketch's truck, under the same rule (this organisation's version, in service unless it is
 *   `keepProfileId`); otherwise the record is left as it is (undefined): a file from elsewhere, a copy of a
 *   plan whose truck has been retired, or a sketch without a truck.
 */
export async function scenePin(
  db: Kysely<Database>,
  organisationId: number,
  body: { equipmentProfileId?: number | null; document?: unknown },
  opts: { keepProfileId?: number | null } = {},
): Promise<ScenePin | undefined> {
  if (body.equipmentProfileId === null) return { equipmentProfileId: null, equipmentProfileVersion: null };
  const sketch = documentTruckPin(body.document);
  if (body.equipmentProfileId === undefined) {
    if (!sketch) return undefined;
    const status = await profileVersionStatus(db, organisationId, sketch.profileId, sketch.profileVersion);
    if (!status || (status.retired && sketch.profileId !== opts.keepProfileId)) return undefined;
    return { equipmentProfileId: sketch.profileId, equipmentProfileVersion: sketch.profileVersion };
  }
  const id = body.equipmentProfileId;
  const current = await pinnedProfileVersion(db, organisationId, id, { allowRetired: id === opts.keepProfileId });
  const drawnFrom = sketch?.profileId === id && sketch.profileVersion !== current && (await profileVersionStatus(db, organisationId, id, sketch.profileVersion)) ? sketch.profileVersion : current;
  return { equipmentProfileId: id, equipmentProfileVersion: drawnFrom };
}
