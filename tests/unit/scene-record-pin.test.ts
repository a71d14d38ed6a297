import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as scenes from '@/app/api/scenes/route';
import * as scene from '@/app/api/scenes/[id]/route';
import { getDb } from '@/db';
import { createEquipmentProfile, findEquipmentProfile, retireEquipmentProfile, updateEquipmentProfile } from '@/db/repositories/equipment';
import { HR4_SPEC, HR7_SPEC } from '@/db/seed/demo-trucks';
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { TRUCKS, truckIdByUnit } from '@/tests/setup/fixtures';
import { call } from '@/tests/setup/call';
import { emptySceneDocument } from '@/lib/scene';
import { documentTruckPin } from '@/lib/server/truck-pin';

/**
 * The scene record says which truck profile version the plan was made with (the equipment issue's rule:
 * a later edit to the truck must not silently change an approved plan). The record follows the sketch's
 * truck when a document is saved, so it always names the version the truck is drawn from.
 */

let hr7: number;
let cobaltTruck: number;

const truck = (profileId: number, profileVersion: number) => ({
  id: 'truck-1', kind: 'truck', profileId, profileVersion, x: 0, y: 0, rotation: 0, locked: false, label: '',
  boom: { slew: 0, elevation: 30, length: 8 },
  legs: {},
});
const docWith = (t: ReturnType<typeof truck> | null) => ({ ...emptySceneDocument(), objects: t ? [t] : [] });
const record = async (id: number) => getDb().selectFrom('scenes').select(['equipment_profile_id', 'equipment_profile_version', 'revision']).where('id', '=', id).executeTakeFirstOrThrow();

beforeAll(async () => {
  await freshSeededDb();
  hr7 = await truckIdByUnit(TRUCKS.harrow);
  cobaltTruck = await truckIdByUnit(TRUCKS.cobalt);
  // An admin edits HR-7 after plans were drawn on version 1: it is now at version 2.
  const admin = await demoUser('admin@harrow.example');
  const p = (await findEquipmentProfile(getDb(), admin.organisationId, hr7))!;
  const out = await updateEquipmentProfile(getDb(), admin.organisationId, hr7, { kind: 'truck', name: p.name, unitNumber: p.unitNumber, spec: { ...HR7_SPEC, notes: 'edited after planning' }, baseVersion: p.version }, admin.id);
  expect(out.kind === 'ok' && out.profile.version).toBe(p.version + 1);
  signInAs(await demoUser('operator@harrow.example'));
});

describe('the scene record follows the sketch’s truck', () => {
  it('reads the truck’s profile and version out of a document', () => {
    expect(documentTruckPin(docWith(truck(7, 3)))).toEqual({ profileId: 7, profileVersion: 3 });
    expect(documentTruckPin(docWith(null))).toBeNull();
    expect(documentTruckPin({ objects: [{ kind: 'truck', profileId: '7', profileVersion: 1 }] })).toBeNull();
  });

  it('a copy of a plan drawn on version 1 records version 1, not the current 2', async () => {
    const res = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Copy on an older truck', equipmentProfileId: hr7, document: docWith(truck(hr7, 1)) } });
    expect(res.status, res.text).toBe(201);
    const r = await record(res.json.id as number);
    expect([r.equipment_profile_id, r.equipment_profile_version]).toEqual([hr7, 1]);
  });

  it('a new scene with no profile named takes the sketch’s truck', async () => {
    const res = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Sketch names its truck', document: docWith(truck(hr7, 2)) } });
    expect(res.status, res.text).toBe(201);
    const r = await record(res.json.id as number);
    expect([r.equipment_profile_id, r.equipment_profile_version]).toEqual([hr7, 2]);
  });

  it('saving a sketch moved to version 2 moves the record to version 2; moving back moves it back', async () => {
    const created = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Moves between versions', equipmentProfileId: hr7, document: docWith(truck(hr7, 1)) } });
    const id = created.json.id as number;
    let put = await call({ handler: scene.PUT, method: 'PUT', id: String(id), body: { revision: 1, document: docWith(truck(hr7, 2)) } });
    expect(put.status, put.text).toBe(200);
    expect(await record(id)).toMatchObject({ equipment_profile_id: hr7, equipment_profile_version: 2, revision: 2 });
    put = await call({ handler: scene.PUT, method: 'PUT', id: String(id), body: { revision: 2, document: docWith(truck(hr7, 1)) } });
    expect(put.status, put.text).toBe(200);
    expect(await record(id)).toMatchObject({ equipment_profile_version: 1, revision: 3 });
  });

  it('a sketch naming another organisation’s truck, or a version that never existed, leaves the record as it was', async () => {
    const created = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Foreign truck in the file', equipmentProfileId: hr7 } });
    const id = created.json.id as number;
    const before = await record(id);
    expect(before.equipment_profile_version).toBe(2);
    let put = await call({ handler: scene.PUT, method: 'PUT', id: String(id), body: { revision: 1, document: docWith(truck(cobaltTruck, 1)) } });
    expect(put.status, put.text).toBe(200);
    expect(await record(id)).toMatchObject({ equipment_profile_id: hr7, equipment_profile_version: 2 });
    put = await call({ handler: scene.PUT, method: 'PUT', id: String(id), body: { revision: 2, document: docWith(truck(hr7, 99)) } });
    expect(put.status, put.text).toBe(200);
    expect(await record(id)).toMatchObject({ equipment_profile_id: hr7, equipment_profile_version: 2 });
  });

  it('a retired truck: a new scene from a sketch on it is made without a pin; a scene already on it keeps it', async () => {
    // The rule of the equipment library: a retired truck cannot be picked for a plan, though a scene already
    // on it may keep it.
    const admin = await demoUser('admin@harrow.example');
    const spare = await createEquipmentProfile(getDb(), admin.organisationId, { kind: 'truck', name: 'Spare wrecker (example values)', unitNumber: 'HR-9', inService: true, spec: HR4_SPEC }, admin.id);
    const kept = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Planned before retirement', document: docWith(truck(spare.id, 1)) } });
    expect(await record(kept.json.id as number)).toMatchObject({ equipment_profile_id: spare.id, equipment_profile_version: 1 });
    await retireEquipmentProfile(getDb(), admin.organisationId, spare.id);

    const copy = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Copy after retirement', document: docWith(truck(spare.id, 1)) } });
    expect(copy.status, copy.text).toBe(201);
    expect(await record(copy.json.id as number)).toMatchObject({ equipment_profile_id: null, equipment_profile_version: null });
    const named = await call({ handler: scenes.POST, method: 'POST', body: { title: 'Named after retirement', equipmentProfileId: spare.id, document: docWith(truck(spare.id, 1)) } });
    expect(named.status).toBe(400);
    expect(named.json.issues?.[0].path).toBe('equipmentProfileId');

    const put = await call({ handler: scene.PUT, method: 'PUT', id: String(kept.json.id), body: { revision: 1, document: docWith(truck(spare.id, 1)) } });
    expect(put.status, put.text).toBe(200);
    expect(await record(kept.json.id as number)).toMatchObject({ equipment_profile_id: spare.id, equipment_profile_version: 1, revision: 2 });
  });
});
