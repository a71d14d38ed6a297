import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { findEquipmentProfile, findProfileVersion, listEquipmentProfiles } from '@/db/repositories/equipment';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';

/**
 * The truck profiles the editor offers: the organisation's trucks at their current versions, the scene's
 * chosen one first. When the scene's truck was planned with an older version, that exact version's spec
 * is added after them, so a later edit to the profile cannot silently change the plan. Server only.
 */
export async function loadSceneProfiles(db: Kysely<Database>, organisationId: number, doc: SceneDocument, sceneProfileId: number | null): Promise<TruckProfileInput[]> {
  const list = (await listEquipmentProfiles(db, organisationId)).filter((p) => p.kind === 'truck');
  const out: TruckProfileInput[] = list.map((p) => ({ id: p.id, version: p.version, name: p.name, unitNumber: p.unitNumber, spec: p.spec }));
  const truck = doc.objects.find((o) => o.kind === 'truck');
  if (truck && truck.kind === 'truck' && !out.some((p) => p.id === truck.profileId)) {
    const p = await findEquipmentProfile(db, organisationId, truck.profileId);
    if (p && p.kind === 'truck') out.push({ id: p.id, version: p.version, name: p.name, unitNumber: p.unitNumber, spec: p.spec });
  }
  const first = truck && truck.kind === 'truck' ? truck.profileId : sceneProfileId;
  out.sort((a, b) => Number(b.id === first) - Number(a.id === first));
  if (truck && truck.kind === 'truck' && out.some((p) => p.id === truck.profileId) && !out.some((p) => p.id === truck.profileId && p.version === truck.profileVersion)) {
    const v = await findProfileVersion(db, organisationId, truck.profileId, truck.profileVersion);
    if (v) out.push({ id: v.profileId, version: v.version, name: v.name, unitNumber: v.unitNumber, spec: v.spec });
  }
  return out;
}
