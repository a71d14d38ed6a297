import type { DB } from '@/db';
import { getDb } from '@/db';
import { createScene, softDeleteScene } from '@/db/repositories/scenes';
import { createUser, findUserById } from '@/db/repositories/users';
import { createEquipmentProfile, retireEquipmentProfile } from '@/db/repositories/equipment';
import { createLesson } from '@/db/repositories/lessons';
import type { CurrentUser } from '@/lib/auth/current-user';
import { HR4_SPEC } from '@/db/seed/demo-trucks';
import { storeSceneUpload } from '@/lib/server/store-scene-upload';
import { sniffImage } from '@/lib/image-sniff';
import { makePng } from '@/tests/fixtures/images';
import { submitPlan } from '@/lib/server/review';

/**
 * Test-only additions to the demo scenario, so every access rule has something to bite on: a second
 * Harrow Ridge operator with a draft and an approved scene, a deleted scene and a retired truck.
 */
export const PEER_EMAIL = 'rowan.pike@harrow.example';
export const TITLES = {
  ownDraft: 'Coil transfer, Route 9 weigh station',
  ownApproved: 'Overturned reefer trailer, Mill Creek on-ramp',
  otherOrg: 'Box truck up the embankment, Quarry Road',
  peerDraft: 'Peer draft: flatbed off the shoulder, Gorse Lane',
  peerApproved: 'Peer approved: bus lifted clear of the ditch, Fenwick Hill',
  deleted: 'Deleted: cement mixer at the quarry gate',
  ownSubmitted: 'Submitted: wheel loader off the verge, Brock Road',
} as const;
export const TRUCKS = { harrow: 'HR-7', cobalt: 'CF-2', retired: 'HR-1' } as const;
export const LESSONS = { harrow: 'Harrow lesson: reading tipping lines', cobalt: 'Cobalt lesson: embankment pulls' } as const;

async function asCurrentUser(db: DB, id: number): Promise<CurrentUser> {
  const u = (await findUserById(db, id))!;
  return { id: u.id, organisationId: u.organisation_id, organisationName: u.organisation_name, role: u.role, name: u.name, email: u.email, units: u.units };
}

export async function addAccessFixtures(db: DB): Promise<void> {
  const harrow = await db.selectFrom('organisations').select('id').where('slug', '=', 'harrow-ridge').executeTakeFirstOrThrow();
  // The hash is never checked: nobody signs in as the peer through next-auth in unit tests.
  const peerRow = await createUser(db, { organisation_id: harrow.id, email: PEER_EMAIL, name: 'Rowan Pike', role: 'operator', password_hash: 'unused' });
  const peer = await asCurrentUser(db, peerRow.id);
  await createScene(db, peer, { title: TITLES.peerDraft, document: { version: 1, objects: [] } });
  const approved = await createScene(db, peer, { title: TITLES.peerApproved, document: { version: 1, objects: [] } });
  await db.updateTable('scenes').set({ status: 'approved' }).where('id', '=', approved.id).execute();
  const operator = await db.selectFrom('users').select('id').where('email', '=', 'operator@harrow.example').executeTakeFirstOrThrow();
  const gone = await createScene(db, await asCurrentUser(db, operator.id), { title: TITLES.deleted, document: { version: 1, objects: [] } });
  await softDeleteScene(db, await asCurrentUser(db, operator.id), gone.id);
  const retired = await createEquipmentProfile(db, harrow.id, { kind: 'truck', name: '25-ton wrecker (example values, retired)', unitNumber: TRUCKS.retired, spec: HR4_SPEC });
  await retireEquipmentProfile(db, harrow.id, retired.id);
  // A plan of the operator's awaiting review (the coil transfer's sketch), submitted through the service.
  const draft = await db.selectFrom('scenes').select('document').where('title', '=', TITLES.ownDraft).executeTakeFirstOrThrow();
  const op = await asCurrentUser(db, operator.id);
  const submitted = await createScene(db, op, { title: TITLES.ownSubmitted, document: draft.document });
  const out = await submitPlan(db, op, submitted.id, 1);
  if (out.status !== 200) throw new Error(`fixture submit failed: ${JSON.stringify(out.body)}`);
  // A lesson in each organisation (the Cobalt one is written directly: its scene is not in a training set).
  const trainer = await db.selectFrom('users').select('id').where('email', '=', 'trainer@harrow.example').executeTakeFirstOrThrow();
  const reefer = await sceneIdByTitle(TITLES.ownApproved, db);
  await createLesson(db, await asCurrentUser(db, trainer.id), { title: LESSONS.harrow, steps: [{ sceneId: reefer, revision: 1, notes: 'Where does the boom cross the rear tipping line?' }] });
  const cobaltOp = await db.selectFrom('users').select(['id', 'organisation_id']).where('email', '=', 'operator@cobalt.example').executeTakeFirstOrThrow();
  const lesson = await db.insertInto('lessons').values({ organisation_id: cobaltOp.organisation_id, author_id: cobaltOp.id, title: LESSONS.cobalt }).returning('id').executeTakeFirstOrThrow();
  await db.insertInto('lesson_steps').values({ lesson_id: lesson.id, position: 0, scene_id: await sceneIdByTitle(TITLES.otherOrg, db), revision: 1, question: null, answer: null }).execute();
  // A site background image on the operator's draft and on the other organisation's scene.
  const png = makePng(4, 3);
  for (const title of [TITLES.ownDraft, TITLES.otherOrg]) {
    const scene = await db.selectFrom('scenes').select(['id', 'organisation_id', 'owner_id']).where('title', '=', title).executeTakeFirstOrThrow();
    await storeSceneUpload(db, { organisationId: scene.organisation_id, sceneId: scene.id, uploaderId: scene.owner_id, bytes: png, image: sniffImage(png)! });
  }
}

export async function sceneIdByTitle(title: string, db: DB = getDb()): Promise<number> {
  return (await db.selectFrom('scenes').select('id').where('title', '=', title).executeTakeFirstOrThrow()).id;
}

export async function truckIdByUnit(unit: string, db: DB = getDb()): Promise<number> {
  return (await db.selectFrom('equipment_profiles').select('id').where('unit_number', '=', unit).executeTakeFirstOrThrow()).id;
}
