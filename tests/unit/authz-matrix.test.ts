import { vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as scenes from '@/app/api/scenes/route';
import * as scene from '@/app/api/scenes/[id]/route';
import * as training from '@/app/api/scenes/[id]/training/route';
import * as planDetails from '@/app/api/scenes/[id]/details/route';
import * as planPdf from '@/app/api/scenes/[id]/plan.pdf/route';
import * as equipment from '@/app/api/equipment/route';
import * as equipmentOne from '@/app/api/equipment/[id]/route';
import * as duplicate from '@/app/api/equipment/[id]/duplicate/route';
import * as retire from '@/app/api/equipment/[id]/retire/route';
import * as versions from '@/app/api/equipment/[id]/versions/route';
import * as version from '@/app/api/equipment/[id]/versions/[version]/route';
import * as rigging from '@/app/api/rigging/route';
import * as riggingOne from '@/app/api/rigging/[id]/route';
import * as inspections from '@/app/api/rigging/[id]/inspections/route';
import * as riggingExport from '@/app/api/rigging/export/route';
import * as riggingImport from '@/app/api/rigging/import/route';
import * as users from '@/app/api/users/route';
import * as userOne from '@/app/api/users/[id]/route';
import * as userReset from '@/app/api/users/[id]/password-reset/route';
import * as passwordReset from '@/app/api/password-reset/route';
import * as analyze from '@/app/api/analyze/route';
import * as sceneAnalysis from '@/app/api/scenes/[id]/analysis/route';
import * as submit from '@/app/api/scenes/[id]/submit/route';
import * as withdraw from '@/app/api/scenes/[id]/withdraw/route';
import * as decision from '@/app/api/scenes/[id]/decision/route';
import * as newRevision from '@/app/api/scenes/[id]/new-revision/route';
import * as comments from '@/app/api/scenes/[id]/comments/route';
import * as commentOne from '@/app/api/scenes/[id]/comments/[commentId]/route';
import * as notifications from '@/app/api/notifications/route';
import * as notificationsRead from '@/app/api/notifications/read/route';
import { REVIEW_TITLES } from '@/db/seed/demo-review-scenes';
import * as revisions from '@/app/api/scenes/[id]/revisions/route';
import * as revisionOne from '@/app/api/scenes/[id]/revisions/[revision]/route';
import * as trainingCopy from '@/app/api/scenes/[id]/training-copy/route';
import * as background from '@/app/api/scenes/[id]/background/route';
import * as backgroundImage from '@/app/api/scenes/[id]/background/[uploadId]/route';
import { makePng } from '@/tests/fixtures/images';
import { squareOfPads } from '@/tests/lift/scenarios';
import * as me from '@/app/api/me/route';
import { DEMO_PASSWORD } from '@/db/seed/demo-users';
import * as mePassword from '@/app/api/me/password/route';
import * as lessons from '@/app/api/lessons/route';
import * as lesson from '@/app/api/lessons/[id]/route';
import { getDb } from '@/db';
import { HR4_SPEC } from '@/db/seed/demo-trucks';
import { describeMatrix, type MatrixRoute, type Target, type TargetResolver } from '@/tests/setup/route-matrix';
import { LESSONS, PEER_EMAIL, TITLES, TRUCKS, sceneIdByTitle, truckIdByUnit } from '@/tests/setup/fixtures';

/**
 * Who may do what, for every route. Columns, in order:
 *   signed out | operator | supervisor | trainer | admin | other-org operator
 * "operator" is Harrow Ridge's operator@harrow.example; "other-org" is Cobalt Flats' operator. A peer
 * Harrow operator owns the "peer" scenes. Another organisation's ids answer 404, as unknown ids do.
 *
 * To add a route: import its module, add a row (its targets may be new entries in `targets`).
 */

const sceneTarget = (title: string): TargetResolver => async () => {
  const id = await sceneIdByTitle(title);
  const row = await getDb().selectFrom('scenes').select(['revision', 'in_training_set']).where('id', '=', id).executeTakeFirstOrThrow();
  return { id: String(id), revision: row.revision, inTrainingSet: row.in_training_set === 1 };
};
const truckTarget = (unit: string): TargetResolver => async () => {
  const id = await truckIdByUnit(unit);
  const row = await getDb().selectFrom('equipment_profiles').select('version').where('id', '=', id).executeTakeFirstOrThrow();
  return { id: String(id), profileId: id, version: row.version };
};

const slingTarget = (tag: string): TargetResolver => async () => {
  const row = await getDb().selectFrom('rigging_items').select('id').where('tag', '=', tag).executeTakeFirstOrThrow();
  return { id: String(row.id) };
};
const imageTarget = (title: string): TargetResolver => async () => {
  const id = await sceneIdByTitle(title);
  const upload = await getDb().selectFrom('scene_uploads').select('id').where('scene_id', '=', id).executeTakeFirstOrThrow();
  return { id: String(id), uploadId: String(upload.id) };
};
const pngForm = () => {
  const form = new FormData();
  form.append('file', new Blob([makePng(8, 6)], { type: 'image/png' }), 'site.png');
  return { body: form };
};
const lessonTarget = (title: string): TargetResolver => async () => {
  const row = await getDb().selectFrom('lessons').select('id').where('title', '=', title).executeTakeFirstOrThrow();
  return { id: String(row.id), sceneId: await sceneIdByTitle(TITLES.ownApproved) };
};
/** A lesson body on Harrow's training-set scene; other organisations see that scene as unknown (400). */
const lessonBody = (t: Target) => ({ title: 'Matrix: lesson', steps: [{ sceneId: t.sceneId, revision: 1, notes: 'Watch the rear pads.' }] });
const today = () => new Date().toISOString().slice(0, 10);

const userTarget = (email: string): TargetResolver => async () => ({ id: String((await getDb().selectFrom('users').select('id').where('email', '=', email).executeTakeFirstOrThrow()).id) });

const targets: Record<string, TargetResolver> = {
  '-': async () => ({}),
  'Harrow: operator’s draft': sceneTarget(TITLES.ownDraft),
  'Harrow: operator’s approved': sceneTarget(TITLES.ownApproved),
  'Harrow: peer’s draft': sceneTarget(TITLES.peerDraft),
  'Harrow: peer’s approved': sceneTarget(TITLES.peerApproved),
  'Harrow: deleted scene': sceneTarget(TITLES.deleted),
  'Cobalt: scene': sceneTarget(TITLES.otherOrg),
  'unknown id': async () => ({ id: '987654', revision: 1, profileId: 987654, version: 1 }),
  'Harrow: truck': truckTarget(TRUCKS.harrow),
  'Harrow: retired truck': truckTarget(TRUCKS.retired),
  'Cobalt: truck': truckTarget(TRUCKS.cobalt),
  'Harrow: sling': slingTarget('HR-RS-01'),
  'Harrow: draft’s image': imageTarget(TITLES.ownDraft),
  'Cobalt: scene’s image': imageTarget(TITLES.otherOrg),
  'Cobalt: sling': slingTarget('CF-RS-01'),
  'Harrow: operator’s submitted': sceneTarget(TITLES.ownSubmitted),
  'Harrow: peer’s submitted beyond a hard limit': sceneTarget(REVIEW_TITLES.beyond),
  'Harrow: pinned comment': async () => {
    const id = await sceneIdByTitle(REVIEW_TITLES.awaiting);
    const c = await getDb().selectFrom('scene_comments').select('id').where('scene_id', '=', id).executeTakeFirstOrThrow();
    return { id: String(id), commentId: String(c.id) };
  },
  'Harrow: lesson': lessonTarget(LESSONS.harrow),
  'Cobalt: lesson': lessonTarget(LESSONS.cobalt),
  'Harrow: training scene': async () => ({ sceneId: await sceneIdByTitle(TITLES.ownApproved) }),
  'unknown lesson': async () => ({ id: '987654', sceneId: await sceneIdByTitle(TITLES.ownApproved) }),
  'Harrow: trainer': userTarget('trainer@harrow.example'),
  'Cobalt: operator': userTarget('operator@cobalt.example'),
};
const lessonWrites = ['lessons', 'lesson_steps', 'audit_log'];

const sceneWrites = ['scenes', 'scene_revisions', 'audit_log'];
/** Every profile change also keeps the new version in the history. */
const truckWrites = ['equipment_profiles', 'equipment_profile_versions', 'audit_log'];

const routes: MatrixRoute[] = [
  // ── scenes ─────────────────────────────────────────────────────────────
  { method: 'GET', path: '/api/scenes', handler: scenes.GET, expect: { '-': [401, 200, 200, 200, 200, 200] } },
  {
    method: 'POST', path: '/api/scenes', handler: scenes.POST, writes: sceneWrites,
    body: (t) => ({ title: 'Matrix: new scene', ...(t.profileId ? { equipmentProfileId: t.profileId } : {}) }),
    expect: {
      '-': [401, 201, 403, 403, 403, 201],
      'Harrow: truck': [401, 201, 403, 403, 403, 400],
      'Harrow: retired truck': [401, 400, 403, 403, 403, 400],
      'Cobalt: truck': [401, 400, 403, 403, 403, 201],
      'unknown id': [401, 400, 403, 403, 403, 400],
    },
  },
  {
    method: 'GET', path: '/api/scenes/[id]', handler: scene.GET,
    expect: {
      'Harrow: operator’s draft': [401, 200, 200, 200, 200, 404],
      'Harrow: operator’s approved': [401, 200, 200, 200, 200, 404],
      'Harrow: peer’s draft': [401, 404, 200, 200, 200, 404],
      'Harrow: peer’s approved': [401, 200, 200, 200, 200, 404],
      'Harrow: deleted scene': [401, 404, 404, 404, 404, 404],
      'Cobalt: scene': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'PUT', path: '/api/scenes/[id]', handler: scene.PUT, writes: sceneWrites,
    body: (t) => ({ revision: t.revision, title: 'Matrix: renamed' }),
    expect: {
      'Harrow: operator’s draft': [401, 200, 403, 403, 403, 404],
      'Harrow: operator’s approved': [401, 409, 403, 403, 403, 404],
      'Harrow: operator’s submitted': [401, 409, 403, 403, 403, 404],
      'Harrow: peer’s draft': [401, 404, 403, 403, 403, 404],
      'Harrow: peer’s approved': [401, 403, 403, 403, 403, 404],
      'Harrow: deleted scene': [401, 404, 403, 403, 403, 404],
      'Cobalt: scene': [401, 404, 403, 403, 403, 200],
      'unknown id': [401, 404, 403, 403, 403, 404],
    },
  },
  {
    method: 'DELETE', path: '/api/scenes/[id]', handler: scene.DELETE, writes: ['scenes', 'audit_log'],
    expect: {
      'Harrow: operator’s draft': [401, 200, 403, 403, 200, 404],
      'Harrow: operator’s approved': [401, 200, 403, 403, 200, 404],
      'Harrow: peer’s draft': [401, 404, 403, 403, 200, 404],
      'Harrow: peer’s approved': [401, 403, 403, 403, 200, 404],
      'Harrow: deleted scene': [401, 404, 403, 403, 404, 404],
      'Cobalt: scene': [401, 404, 403, 403, 404, 200],
      'unknown id': [401, 404, 403, 403, 404, 404],
    },
  },
  {
    method: 'PUT', path: '/api/scenes/[id]/training', handler: training.PUT, writes: ['scenes', 'audit_log'],
    body: (t) => ({ inTrainingSet: !t.inTrainingSet }),
    expect: {
      'Harrow: operator’s draft': [401, 403, 403, 200, 403, 403],
      'Harrow: operator’s approved': [401, 403, 403, 200, 403, 403],
      'Harrow: peer’s draft': [401, 403, 403, 200, 403, 403],
      'Harrow: deleted scene': [401, 403, 403, 404, 403, 403],
      'Cobalt: scene': [401, 403, 403, 404, 403, 403],
      'unknown id': [401, 403, 403, 404, 403, 403],
    },
  },
  {
    method: 'POST', path: '/api/scenes/[id]/background', handler: background.POST, writes: ['scene_uploads', 'audit_log'], init: pngForm,
    expect: {
      'Harrow: operator’s draft': [401, 201, 403, 403, 403, 404],
      'Harrow: peer’s draft': [401, 404, 403, 403, 403, 404],
      'Harrow: peer’s approved': [401, 403, 403, 403, 403, 404],
      'Harrow: deleted scene': [401, 404, 403, 403, 403, 404],
      'Cobalt: scene': [401, 404, 403, 403, 403, 201],
      'unknown id': [401, 404, 403, 403, 403, 404],
    },
  },
  {
    method: 'GET', path: '/api/scenes/[id]/background/[uploadId]', handler: backgroundImage.GET, checkId: false,
    params: (t) => ({ id: t.id!, uploadId: String(t.uploadId) }),
    expect: {
      'Harrow: draft’s image': [401, 200, 200, 200, 200, 404],
      'Cobalt: scene’s image': [401, 404, 404, 404, 404, 200],
    },
  },
  {
    method: 'GET', path: '/api/scenes/[id]/details', handler: planDetails.GET,
    expect: {
      'Harrow: operator’s draft': [401, 200, 200, 200, 200, 404],
      'Harrow: peer’s draft': [401, 404, 200, 200, 200, 404],
      'Harrow: peer’s approved': [401, 200, 200, 200, 200, 404],
      'Harrow: deleted scene': [401, 404, 404, 404, 404, 404],
      'Cobalt: scene': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'GET', path: '/api/scenes/[id]/plan.pdf', handler: planPdf.GET, checkId: false, timeout: 120_000,
    expect: {
      'Harrow: operator’s draft': [401, 200, 200, 200, 200, 404],
      'Harrow: peer’s draft': [401, 404, 200, 200, 200, 404],
      'Harrow: peer’s approved': [401, 200, 200, 200, 200, 404],
      'Cobalt: scene': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'PUT', path: '/api/scenes/[id]/details', handler: planDetails.PUT, writes: [...sceneWrites, 'scene_plan_details'],
    body: (t) => ({ revision: t.revision, details: { job: { customer: 'Matrix customer' } } }),
    expect: {
      'Harrow: operator’s draft': [401, 200, 403, 403, 403, 404],
      'Harrow: peer’s draft': [401, 404, 403, 403, 403, 404],
      'Harrow: peer’s approved': [401, 403, 403, 403, 403, 404],
      'Harrow: deleted scene': [401, 404, 403, 403, 403, 404],
      'Cobalt: scene': [401, 404, 403, 403, 403, 200],
      'unknown id': [401, 404, 403, 403, 403, 404],
    },
  },
  { method: 'POST', path: '/api/analyze', handler: analyze.POST, body: () => squareOfPads(), expect: { '-': [401, 200, 200, 200, 200, 200] } },
  {
    // The peer's scenes are empty sketches: whoever may read them gets 422 (nothing to compute), not 404.
    method: 'GET', path: '/api/scenes/[id]/analysis', handler: sceneAnalysis.GET, checkId: false,
    expect: {
      'Harrow: operator’s draft': [401, 200, 200, 200, 200, 404],
      'Harrow: operator’s approved': [401, 200, 200, 200, 200, 404],
      'Harrow: peer’s draft': [401, 404, 422, 422, 422, 404],
      'Harrow: peer’s approved': [401, 422, 422, 422, 422, 404],
      'Harrow: deleted scene': [401, 404, 404, 404, 404, 404],
      'Cobalt: scene': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    // Lists answer 200 for whoever may read the scene, with null figures where there is nothing to compute.
    method: 'GET', path: '/api/scenes/[id]/revisions', handler: revisions.GET, checkId: false,
    expect: {
      'Harrow: operator’s draft': [401, 200, 200, 200, 200, 404],
      'Harrow: peer’s draft': [401, 404, 200, 200, 200, 404],
      'Harrow: peer’s approved': [401, 200, 200, 200, 200, 404],
      'Harrow: deleted scene': [401, 404, 404, 404, 404, 404],
      'Cobalt: scene': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'GET', path: '/api/scenes/[id]/revisions/[revision]', handler: revisionOne.GET, checkId: false,
    params: (t) => ({ id: t.id!, revision: String(t.revision ?? 1) }),
    expect: {
      'Harrow: operator’s draft': [401, 200, 200, 200, 200, 404],
      'Harrow: peer’s draft': [401, 404, 200, 200, 200, 404],
      'Harrow: deleted scene': [401, 404, 404, 404, 404, 404],
      'Cobalt: scene': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    // A what-if kept as a new training-set scene: trainers and admins, from any scene they may read.
    method: 'POST', path: '/api/scenes/[id]/training-copy', handler: trainingCopy.POST, writes: sceneWrites, checkId: false,
    body: () => ({ title: 'Matrix: what-if copy', document: { version: 2, objects: [] } }),
    expect: {
      'Harrow: operator’s draft': [401, 403, 403, 201, 201, 403],
      'Harrow: deleted scene': [401, 403, 403, 404, 404, 403],
      'Cobalt: scene': [401, 403, 403, 404, 404, 403],
      'unknown id': [401, 403, 403, 404, 404, 403],
    },
  },
  // ── equipment ──────────────────────────────────────────────────────────
  { method: 'GET', path: '/api/equipment', handler: equipment.GET, expect: { '-': [401, 200, 200, 200, 200, 200] } },
  {
    method: 'POST', path: '/api/equipment', handler: equipment.POST, writes: truckWrites,
    body: () => ({ name: 'Matrix: 30-ton rotator (example values)', unitNumber: 'MX-1', spec: HR4_SPEC }),
    expect: { '-': [401, 403, 403, 403, 201, 403] },
  },
  {
    method: 'GET', path: '/api/equipment/[id]', handler: equipmentOne.GET,
    expect: {
      'Harrow: truck': [401, 200, 200, 200, 200, 404],
      'Harrow: retired truck': [401, 200, 200, 200, 200, 404],
      'Cobalt: truck': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'PUT', path: '/api/equipment/[id]', handler: equipmentOne.PUT, writes: truckWrites,
    body: (t) => ({ name: 'Matrix: renamed rotator (example values)', spec: HR4_SPEC, baseVersion: t.version }),
    expect: {
      'Harrow: truck': [401, 403, 403, 403, 200, 403],
      'Harrow: retired truck': [401, 403, 403, 403, 409, 403],
      'Cobalt: truck': [401, 403, 403, 403, 404, 403],
      'unknown id': [401, 403, 403, 403, 404, 403],
    },
  },
  {
    method: 'DELETE', path: '/api/equipment/[id]', handler: equipmentOne.DELETE, writes: ['equipment_profiles', 'audit_log'],
    expect: {
      'Harrow: truck': [401, 403, 403, 403, 200, 403],
      'Harrow: retired truck': [401, 403, 403, 403, 409, 403],
      'Cobalt: truck': [401, 403, 403, 403, 404, 403],
      'unknown id': [401, 403, 403, 403, 404, 403],
    },
  },
  {
    method: 'POST', path: '/api/equipment/[id]/duplicate', handler: duplicate.POST, writes: truckWrites,
    body: () => ({ name: 'Matrix: copy (example values)', unitNumber: 'MX-2' }),
    expect: {
      'Harrow: truck': [401, 403, 403, 403, 201, 403],
      'Cobalt: truck': [401, 403, 403, 403, 404, 403],
      'unknown id': [401, 403, 403, 403, 404, 403],
    },
  },
  {
    method: 'POST', path: '/api/equipment/[id]/retire', handler: retire.POST, writes: ['equipment_profiles', 'audit_log'],
    expect: {
      'Harrow: truck': [401, 403, 403, 403, 200, 403],
      'Harrow: retired truck': [401, 403, 403, 403, 409, 403],
      'Cobalt: truck': [401, 403, 403, 403, 404, 403],
      'unknown id': [401, 403, 403, 403, 404, 403],
    },
  },
  {
    method: 'GET', path: '/api/equipment/[id]/versions', handler: versions.GET, checkId: false,
    expect: {
      'Harrow: truck': [401, 200, 200, 200, 200, 404],
      'Cobalt: truck': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'GET', path: '/api/equipment/[id]/versions/1', handler: version.GET, checkId: false,
    params: (t) => ({ id: t.id!, version: '1' }),
    expect: {
      'Harrow: truck': [401, 200, 200, 200, 200, 404],
      'Cobalt: truck': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  // ── rigging inventory (operators and admins keep it) ───────────────────
  { method: 'GET', path: '/api/rigging', handler: rigging.GET, expect: { '-': [401, 200, 200, 200, 200, 200] } },
  { method: 'GET', path: '/api/rigging/export', handler: riggingExport.GET, expect: { '-': [401, 200, 200, 200, 200, 200] } },
  {
    method: 'POST', path: '/api/rigging', handler: rigging.POST, writes: ['rigging_items', 'audit_log'],
    body: () => ({ tag: 'MX-RS-01', kind: 'round-sling', size: 'purple', length: 3.05 }),
    expect: { '-': [401, 201, 403, 403, 201, 201] },
  },
  {
    method: 'POST', path: '/api/rigging/import', handler: riggingImport.POST, writes: ['rigging_items', 'audit_log'],
    body: () => ({ csv: 'tag,kind,size,length_m\nMX-SH-01,shackle,3/4,\n' }),
    expect: { '-': [401, 201, 403, 403, 201, 201] },
  },
  {
    method: 'GET', path: '/api/rigging/[id]', handler: riggingOne.GET,
    expect: {
      'Harrow: sling': [401, 200, 200, 200, 200, 404],
      'Cobalt: sling': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'PUT', path: '/api/rigging/[id]', handler: riggingOne.PUT, writes: ['rigging_items', 'audit_log'],
    body: () => ({ tag: 'MX-RS-09', kind: 'round-sling', size: 'purple', length: 3.05, notes: 'Matrix edit' }),
    expect: {
      'Harrow: sling': [401, 200, 403, 403, 200, 404],
      'Cobalt: sling': [401, 404, 403, 403, 404, 200],
      'unknown id': [401, 404, 403, 403, 404, 404],
    },
  },
  {
    method: 'GET', path: '/api/rigging/[id]/inspections', handler: inspections.GET, checkId: false,
    expect: {
      'Harrow: sling': [401, 200, 200, 200, 200, 404],
      'Cobalt: sling': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'POST', path: '/api/rigging/[id]/inspections', handler: inspections.POST, writes: ['rigging_items', 'rigging_inspections', 'audit_log'],
    body: () => ({ inspectedOn: today(), result: 'pass' }),
    expect: {
      'Harrow: sling': [401, 201, 403, 403, 201, 404],
      'Cobalt: sling': [401, 404, 403, 403, 404, 201],
      'unknown id': [401, 404, 403, 403, 404, 404],
    },
  },
  // ── the review desk ────────────────────────────────────────────────────
  {
    method: 'POST', path: '/api/scenes/[id]/submit', handler: submit.POST, writes: ['scenes', 'scene_revisions', 'scene_submissions', 'audit_log', 'notifications', 'mail_outbox'],
    body: (t) => ({ revision: t.revision }),
    expect: {
      'Harrow: operator’s draft': [401, 200, 403, 403, 403, 404],
      'Harrow: operator’s approved': [401, 409, 403, 403, 403, 404],
      'Harrow: operator’s submitted': [401, 409, 403, 403, 403, 404],
      'Harrow: peer’s draft': [401, 404, 403, 403, 403, 404],
      'Harrow: peer’s approved': [401, 403, 403, 403, 403, 404],
      'Harrow: deleted scene': [401, 404, 403, 403, 403, 404],
      'unknown id': [401, 404, 403, 403, 403, 404],
    },
  },
  {
    method: 'POST', path: '/api/scenes/[id]/withdraw', handler: withdraw.POST, writes: ['scenes', 'scene_submissions', 'audit_log'],
    expect: {
      'Harrow: operator’s submitted': [401, 200, 403, 403, 403, 404],
      'Harrow: operator’s draft': [401, 409, 403, 403, 403, 404],
      'Harrow: peer’s submitted beyond a hard limit': [401, 404, 403, 403, 403, 404],
      'Harrow: peer’s approved': [401, 403, 403, 403, 403, 404],
      'Cobalt: scene': [401, 404, 403, 403, 403, 409],
      'unknown id': [401, 404, 403, 403, 403, 404],
    },
  },
  {
    method: 'POST', path: '/api/scenes/[id]/decision', handler: decision.POST, writes: ['scenes', 'scene_submissions', 'audit_log', 'notifications', 'mail_outbox'],
    body: (t) => ({ decision: 'approve', revision: t.revision, conditions: 'Matrix condition' }),
    expect: {
      'Harrow: operator’s submitted': [401, 403, 200, 403, 200, 403],
      'Harrow: operator’s draft': [401, 403, 409, 403, 409, 403],
      'Harrow: peer’s submitted beyond a hard limit': [401, 403, 422, 403, 422, 403],
      'Harrow: deleted scene': [401, 403, 404, 403, 404, 403],
      'Cobalt: scene': [401, 403, 404, 403, 404, 403],
      'unknown id': [401, 403, 404, 403, 404, 403],
    },
  },
  {
    method: 'POST', path: '/api/scenes/[id]/new-revision', handler: newRevision.POST, writes: ['scenes', 'scene_revisions', 'audit_log'],
    expect: {
      'Harrow: operator’s approved': [401, 200, 403, 403, 403, 404],
      'Harrow: operator’s draft': [401, 409, 403, 403, 403, 404],
      'Harrow: peer’s approved': [401, 403, 403, 403, 403, 404],
      'Cobalt: scene': [401, 404, 403, 403, 403, 409],
      'unknown id': [401, 404, 403, 403, 403, 404],
    },
  },
  {
    method: 'GET', path: '/api/scenes/[id]/comments', handler: comments.GET, checkId: false,
    expect: {
      'Harrow: operator’s draft': [401, 200, 200, 200, 200, 404],
      'Harrow: peer’s draft': [401, 404, 200, 200, 200, 404],
      'Harrow: deleted scene': [401, 404, 404, 404, 404, 404],
      'Cobalt: scene': [401, 404, 404, 404, 404, 200],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    // Cobalt has no supervisor, so its operator's comment notifies nobody: left out, as writes differ.
    method: 'POST', path: '/api/scenes/[id]/comments', handler: comments.POST, writes: ['scene_comments', 'audit_log', 'notifications', 'mail_outbox'],
    body: () => ({ body: 'Matrix comment', anchor: { x: 1, y: 1 } }),
    expect: {
      'Harrow: operator’s draft': [401, 201, 201, 403, 201, 404],
      'Harrow: peer’s approved': [401, 403, 201, 403, 201, 404],
      'Harrow: peer’s draft': [401, 404, 201, 403, 201, 404],
      'Harrow: deleted scene': [401, 404, 404, 404, 404, 404],
      'unknown id': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'PATCH', path: '/api/scenes/[id]/comments/[commentId]', handler: commentOne.PATCH, writes: ['scene_comments', 'audit_log'],
    params: (t) => ({ id: t.id!, commentId: String(t.commentId) }),
    body: () => ({ resolved: true }),
    expect: { 'Harrow: pinned comment': [401, 404, 200, 403, 200, 404] },
  },
  { method: 'GET', path: '/api/notifications', handler: notifications.GET, expect: { '-': [401, 200, 200, 200, 200, 200] } },
  { method: 'POST', path: '/api/notifications/read', handler: notificationsRead.POST, body: () => ({ ids: [] }), expect: { '-': [401, 200, 200, 200, 200, 200] } },
  // ── lessons ─────────────────────────────────────────────────────────────
  { method: 'GET', path: '/api/lessons', handler: lessons.GET, expect: { '-': [401, 200, 200, 200, 200, 200] } },
  {
    method: 'POST', path: '/api/lessons', handler: lessons.POST, writes: lessonWrites, body: lessonBody,
    expect: { 'Harrow: training scene': [401, 403, 403, 201, 201, 403] },
  },
  {
    method: 'GET', path: '/api/lessons/[id]', handler: lesson.GET,
    expect: {
      'Harrow: lesson': [401, 200, 200, 200, 200, 404],
      'Cobalt: lesson': [401, 404, 404, 404, 404, 200],
      'unknown lesson': [401, 404, 404, 404, 404, 404],
    },
  },
  {
    method: 'PUT', path: '/api/lessons/[id]', handler: lesson.PUT, writes: lessonWrites, body: lessonBody,
    expect: {
      'Harrow: lesson': [401, 403, 403, 200, 200, 403],
      'Cobalt: lesson': [401, 403, 403, 404, 404, 403],
      'unknown lesson': [401, 403, 403, 404, 404, 403],
    },
  },
  {
    method: 'DELETE', path: '/api/lessons/[id]', handler: lesson.DELETE, writes: lessonWrites,
    expect: {
      'Harrow: lesson': [401, 403, 403, 200, 200, 403],
      'Cobalt: lesson': [401, 403, 403, 404, 404, 403],
      'unknown lesson': [401, 403, 403, 404, 404, 403],
    },
  },
  // ── users and the signed-in user ───────────────────────────────────────
  { method: 'GET', path: '/api/users', handler: users.GET, expect: { '-': [401, 403, 403, 403, 200, 403] } },
  {
    method: 'POST', path: '/api/users', handler: users.POST, writes: ['users', 'audit_log'],
    body: () => ({ name: 'Matrix New Hire', email: 'matrix.hire@harrow.example', role: 'operator', password: 'a-long-enough-password' }),
    expect: { '-': [401, 403, 403, 403, 201, 403] },
  },
  {
    method: 'PATCH', path: '/api/users/[id]', handler: userOne.PATCH, writes: ['users', 'audit_log'],
    body: () => ({ role: 'supervisor' }),
    expect: {
      'Harrow: trainer': [401, 403, 403, 403, 200, 403],
      'Cobalt: operator': [401, 403, 403, 403, 404, 403],
      'unknown id': [401, 403, 403, 403, 404, 403],
    },
  },
  {
    method: 'POST', path: '/api/users/[id]/password-reset', handler: userReset.POST, writes: ['password_resets', 'mail_outbox', 'audit_log'],
    expect: {
      'Harrow: trainer': [401, 403, 403, 403, 202, 403],
      'Cobalt: operator': [401, 403, 403, 403, 404, 403],
      'unknown id': [401, 403, 403, 403, 404, 403],
    },
  },
  // No session needed: the token is the proof. One never sent answers alike for everyone, and writes nothing.
  {
    method: 'POST', path: '/api/password-reset', handler: passwordReset.POST,
    body: () => ({ token: 'A'.repeat(43), newPassword: 'a-long-enough-password' }),
    expect: { '-': [400, 400, 400, 400, 400, 400] },
  },
  { method: 'GET', path: '/api/me', handler: me.GET, expect: { '-': [401, 200, 200, 200, 200, 200] } },
  {
    method: 'PATCH', path: '/api/me', handler: me.PATCH, writes: ['users'],
    body: () => ({ units: 'metric' }),
    expect: { '-': [401, 200, 200, 200, 200, 200] },
  },
  {
    method: 'POST', path: '/api/me/password', handler: mePassword.POST, writes: ['users', 'audit_log'],
    body: () => ({ currentPassword: DEMO_PASSWORD, newPassword: 'a fresh passphrase for the matrix' }),
    expect: { '-': [401, 200, 200, 200, 200, 200] },
  },
];

const harrowMarkers = [LESSONS.harrow, TITLES.ownDraft, TITLES.ownApproved, TITLES.peerDraft, TITLES.peerApproved, 'harrow.example', 'Harrow Ridge', TRUCKS.harrow, TRUCKS.retired];
const cobaltMarkers = [TITLES.otherOrg, 'cobalt.example', 'Cobalt Flats', TRUCKS.cobalt, LESSONS.cobalt];

describeMatrix('authorisation matrix', routes, targets, {
  'signed out': [...harrowMarkers, ...cobaltMarkers],
  operator: [...cobaltMarkers, TITLES.peerDraft, TITLES.deleted, PEER_EMAIL],
  supervisor: [...cobaltMarkers, TITLES.deleted],
  trainer: [...cobaltMarkers, TITLES.deleted],
  admin: [...cobaltMarkers, TITLES.deleted],
  'other-org operator': harrowMarkers,
});
