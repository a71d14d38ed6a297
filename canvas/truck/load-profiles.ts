import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { findEquipmentProfile, listEquipmentProfiles } from '@/db/repositories/equipment';
import type { SceneDocument } from '../document/schema';
import type { TruckProfileInput } from './from-spec';

/**
 * The truck profiles the editor offers: the organisation's in-service trucks, the scene's chosen one
 * first. Server only. A scene's truck is drawn from the profile version it was planned with.
 */
export async function loadSceneProfiles(db: Kysely<Database>, organisationId: number, doc: SceneDocument, sceneProfileId: number | null): Promise<TruckProfileInput[]> {
  const list = (await listEquipmentProfiles(db, organisationId)).filter((p) => p.kind === 'truck');
  const out: TruckProfileInput[] = list.map((p) => ({ id: p.id, version: p.version, name: p.name, unitNumber: p.unitNumber, spec: p.spec }));
  const truck = doc.objects.find((o) => o.kind === 'truck');
  if (truck && truck.kind === 'truck' && !out.some((p) => p.id === truck.profileId)) {
    const p = await findEquipmentProfile(db, organisationId, truck.profileId);
    if (p) out.push({ id: p.id, version: p.version, name: p.name, unitNumber: p.unitNumber, spec: p.spec });
  }
  const first = truck && truck.kind === 'truck' ? truck.profileId : sceneProfileId;
  return out.sort((a, b) => Number(b.id === first) - Number(a.id === first));
}
