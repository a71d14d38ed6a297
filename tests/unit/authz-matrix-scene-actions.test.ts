import { vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import * as restore from '@/app/api/scenes/[id]/restore/route';
import * as archive from '@/app/api/scenes/[id]/archive/route';
import * as duplicate from '@/app/api/scenes/[id]/duplicate/route';
import * as deleted from '@/app/api/scenes/deleted/route';
import { getDb } from '@/db';
import { describeMatrix, type MatrixRoute, type TargetResolver } from '@/tests/setup/route-matrix';
import { PEER_EMAIL, TITLES, TRUCKS, sceneIdByTitle } from '@/tests/setup/fixtures';

/**
 * Who may delete-and-restore, archive and copy scenes. Columns, in order:
 *   signed out | operator | supervisor | trainer | admin | other-org operator
 * (as in tests/unit/authz-matrix.test.ts). Another organisation's scene answers 404, as an unknown one does.
 */

const scene = (title: string): TargetResolver => async () => ({ id: String(await sceneIdByTitle(title)) });
/** The fixture's deleted scene, its deletion moved to `daysAgo` days back (idempotent, so tests may run in any order). */
const deletedDaysAgo = (daysAgo: number): TargetResolver => async () => {
  const id = await sceneIdByTitle(TITLES.deleted);
  await getDb().updateTable('scenes').set({ deleted_at: new Date(Date.now() - daysAgo * 86_400_000).toISOString() }).where('id', '=', id).execute();
  return { id: String(id) };
};
/** The operator's approved scene, archived (as the archive route would leave it). */
const archivedScene: TargetResolver = async () => {
  const id = await sceneIdByTitle(TITLES.ownApproved);
  await getDb().updateTable('scenes').set({ status: 'archived', archived_from: 'approved' }).where('id', '=', id).execute();
  return { id: String(id) };
};
/** The same scene, not archived (undoes archivedScene for the rows that follow). */
const approvedScene: TargetResolver = async () => {
  const id = await sceneIdByTitle(TITLES.ownApproved);
  await getDb().updateTable('scenes').set({ status: 'approved', archived_from: null }).where('id', '=', id).execute();
  return { id: String(id) };
};

const targets: Record<string, TargetResolver> = {
  '-': async () => ({}),
  'Harrow: operator’s draft': scene(TITLES.ownDraft),
  'Harrow: operator’s approved': approvedScene,
  'Harrow: operator’s archived': archivedScene,
  'Harrow: operator’s submitted': scene(TITLES.ownSubmitted),
  'Harrow: peer’s draft': scene(TITLES.peerDraft),
  'Harrow: peer’s approved': scene(TITLES.peerApproved),
  'Harrow: deleted yesterday': deletedDaysAgo(1),
  'Harrow: deleted 31 days ago': deletedDaysAgo(31),
  'Cobalt: scene': scene(TITLES.otherOrg),
  'unknown id': async () => ({ id: '987654' }),
};

const routes: MatrixRoute[] = [
  { method: 'GET', path: '/api/scenes/deleted', handler: deleted.GET, expect: { '-': [401, 403, 403, 403, 200, 403] } },
  {
    method: 'POST', path: '/api/scenes/[id]/restore', handler: restore.POST, writes: ['scenes', 'audit_log'],
    expect: {
      'Harrow: deleted yesterday': [401, 403, 403, 403, 200, 403],
      'Harrow: deleted 31 days ago': [401, 403, 403, 403, 404, 403],
      'Harrow: operator’s draft': [401, 403, 403, 403, 404, 403],
      'Cobalt: scene': [401, 403, 403, 403, 404, 403],
      'unknown id': [401, 403, 403, 403, 404, 403],
    },
  },
  {
    method: 'PUT', path: '/api/scenes/[id]/archive', handler: archive.PUT, writes: ['scenes', 'audit_log'],
    body: () => ({ archived: true }),
    expect: {
      'Harrow: operator’s draft': [401, 200, 403, 403, 200, 404],
      'Harrow: operator’s approved': [401, 200, 403, 403, 200, 404],
      'Harrow: operator’s archived': [401, 409, 403, 403, 409, 404],
      'Harrow: operator’s submitted': [401, 409, 403, 403, 409, 404],
      'Harrow: peer’s draft': [401, 404, 403, 403, 200, 404],
      'Harrow: peer’s approved': [401, 403, 403, 403, 200, 404],
      'Harrow: deleted yesterday': [401, 404, 403, 403, 404, 404],
      'Cobalt: scene': [401, 404, 403, 403, 404, 200],
      'unknown id': [401, 404, 403, 403, 404, 404],
    },
  },
  {
    method: 'PUT', path: '/api/scenes/[id]/archive', handler: archive.PUT, writes: ['scenes', 'audit_log'],
    body: () => ({ archived: false }),
    expect: {
      'Harrow: operator’s archived': [401, 200, 403, 403, 200, 404],
      'Harrow: operator’s draft': [401, 409, 403, 403, 409, 404],
      'Cobalt: scene': [401, 404, 403, 403, 404, 409],
    },
  },
  {
    method: 'POST', path: '/api/scenes/[id]/duplicate', handler: duplicate.POST, writes: ['scenes', 'scene_revisions', 'audit_log'],
    body: () => ({}),
    expect: {
      'Harrow: operator’s draft': [401, 201, 403, 403, 403, 404],
      'Harrow: operator’s approved': [401, 201, 403, 403, 403, 404],
      'Harrow: peer’s draft': [401, 404, 403, 403, 403, 404],
      'Harrow: peer’s approved': [401, 201, 403, 403, 403, 404],
      'Harrow: deleted yesterday': [401, 404, 403, 403, 403, 404],
      'Cobalt: scene': [401, 404, 403, 403, 403, 201],
      'unknown id': [401, 404, 403, 403, 403, 404],
    },
  },
];

const harrowMarkers = [TITLES.ownDraft, TITLES.ownApproved, TITLES.peerDraft, TITLES.peerApproved, 'harrow.example', 'Harrow Ridge', TRUCKS.harrow];
const cobaltMarkers = [TITLES.otherOrg, 'cobalt.example', 'Cobalt Flats', TRUCKS.cobalt];

describeMatrix('authorisation matrix: scene actions', routes, targets, {
  'signed out': [...harrowMarkers, ...cobaltMarkers, TITLES.deleted],
  operator: [...cobaltMarkers, TITLES.peerDraft, TITLES.deleted, PEER_EMAIL],
  supervisor: [...cobaltMarkers, TITLES.deleted],
  trainer: [...cobaltMarkers, TITLES.deleted],
  // The admin's "Recently deleted" and restore answer the deleted scene's title by design.
  admin: cobaltMarkers,
  'other-org operator': [...harrowMarkers, TITLES.deleted],
});
