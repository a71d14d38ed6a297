import { beforeAll, describe, expect, it } from 'vitest';
import type { DB } from '@/db';
import { getScene } from '@/db/repositories/scenes';
import { findEquipmentProfile, updateEquipmentProfile } from '@/db/repositories/equipment';
import { HR7_SPEC } from '@/db/seed/demo-trucks';
import { parseSceneDocument } from '@/lib/scene/parse';
import type { SceneDocument } from '@/lib/scene/schema';
import type { TruckObject } from '@/lib/scene/objects';
import { loadSceneProfiles } from '@/lib/server/load-profiles';
import { currentProfile, currentProfiles } from '@/lib/scene/truck/profile-versions';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';
import { createEditorStore } from '@/canvas/store/editor-store';
import { moveTruckToProfileVersion } from '@/canvas/commands/truck';
import type { CurrentUser } from '@/lib/auth/current-user';
import { freshSeededDb, demoUser } from '@/tests/setup/db';
import { sceneIdByTitle, truckIdByUnit, TITLES } from '@/tests/setup/fixtures';

let db: DB;
let operator: CurrentUser;
let doc: SceneDocument;
let profileId: number;

// The edit an admin makes after the plan was drawn: a longer last boom stage and lower pad ratings.
const EDITED = {
  ...HR7_SPEC,
  boom: { ...HR7_SPEC.boom, stages: [...HR7_SPEC.boom.stages.slice(0, 2), { ...HR7_SPEC.boom.stages[2], length: 16.2 }] },
  outriggers: { legs: HR7_SPEC.outriggers.legs.map((l) => ({ ...l, padRating: 15000 })) },
};

beforeAll(async () => {
  db = await freshSeededDb();
  operator = await demoUser('operator@harrow.example');
  const admin = await demoUser('admin@harrow.example');
  const scene = (await getScene(db, operator, await sceneIdByTitle(TITLES.ownDraft, db)))!;
  const parsed = parseSceneDocument(scene.document);
  if (!parsed.ok) throw new Error('seeded scene does not parse');
  doc = parsed.document;
  profileId = await truckIdByUnit('HR-7', db);
  const p = (await findEquipmentProfile(db, operator.organisationId, profileId))!;
  const out = await updateEquipmentProfile(db, operator.organisationId, profileId, { kind: 'truck', name: p.name, unitNumber: p.unitNumber, spec: EDITED, baseVersion: p.version }, admin.id);
  expect(out.kind).toBe('ok');
});

const truckOf = (d: SceneDocument) => d.objects.find((o): o is TruckObject => o.kind === 'truck')!;

describe('a scene planned with an older profile version', () => {
  it('is planned with version 1 of HR-7, which is now at version 2', () => {
    expect(truckOf(doc).profileId).toBe(profileId);
    expect(truckOf(doc).profileVersion).toBe(1);
  });

  it('loadSceneProfiles hands the editor version 1’s spec as well as the current one', async () => {
    const profiles = await loadSceneProfiles(db, operator.organisationId, doc, profileId);
    const hr7 = profiles.filter((p) => p.id === profileId);
    expect(hr7.map((p) => p.version).sort()).toEqual([1, 2]);
    const v1 = hr7.find((p) => p.version === 1)!.spec as typeof HR7_SPEC;
    const v2 = hr7.find((p) => p.version === 2)!.spec as typeof HR7_SPEC;
    expect(v1.boom.stages.map((s) => s.length)).toEqual([6.4, 10.4, 14.6]);
    expect(v1.outriggers.legs.map((l) => l.padRating)).toEqual([18000, 18000, 18000, 18000, 9000]);
    expect(v2.boom.stages.map((s) => s.length)).toEqual([6.4, 10.4, 16.2]);
    expect(v2.outriggers.legs.map((l) => l.padRating)).toEqual([15000, 15000, 15000, 15000, 15000]);
    // The current versions come first (a new truck is placed from profiles[0]); the old one is extra.
    expect(profiles[0]).toMatchObject({ id: profileId, version: 2 });
    expect(currentProfiles(profiles).map((p) => p.id)).toEqual([...new Set(profiles.map((p) => p.id))]);
    expect(currentProfile(profiles, profileId)!.version).toBe(2);
  });

  it('adds nothing extra when the plan uses the current version', async () => {
    const atCurrent = { ...doc, objects: doc.objects.map((o) => (o.kind === 'truck' ? { ...o, profileVersion: 2 } : o)) };
    const profiles = await loadSceneProfiles(db, operator.organisationId, atCurrent, profileId);
    expect(profiles.filter((p) => p.id === profileId).map((p) => p.version)).toEqual([2]);
  });

  it('the editor draws the truck from version 1 exactly, and moving to version 2 is one undo step', async () => {
    const profiles = await loadSceneProfiles(db, operator.organisationId, doc, profileId);
    const store = createEditorStore({ document: doc, profiles });
    const model = store.getState().truck!;
    expect(model.profileVersion).toBe(1);
    expect(model.boom.maxLength).toBe(14.6);
    expect(model.legs.map((l) => l.padRatingKg)).toEqual([18000, 18000, 18000, 18000, 9000]);
    const before = truckOf(store.getState().document);

    store.getState().run(moveTruckToProfileVersion(truckModelFromProfile(currentProfile(profiles, profileId)!)));
    const moved = truckOf(store.getState().document);
    expect(moved.profileVersion).toBe(2);
    expect(store.getState().truck!.boom.maxLength).toBe(16.2);
    expect(store.getState().truck!.legs.map((l) => l.padRatingKg)).toEqual([15000, 15000, 15000, 15000, 15000]);
    // Same legs in both versions: extensions and cribbing carry over unchanged.
    expect(moved.legs).toEqual(before.legs);
    expect(store.getState().undoStack).toHaveLength(1);

    store.getState().undo();
    expect(truckOf(store.getState().document).profileVersion).toBe(1);
    expect(store.getState().truck!.boom.maxLength).toBe(14.6);
  });

  it('without the exact version the editor has no truck model rather than another version’s figures', () => {
    const store = createEditorStore({ document: doc, profiles: [{ id: profileId, version: 2, name: 'HR-7', unitNumber: 'HR-7', spec: EDITED }] });
    expect(store.getState().truck).toBeNull();
  });
});
