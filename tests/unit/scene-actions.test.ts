import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { call } from '@/tests/setup/call';
import * as scenes from '@/app/api/scenes/route';
import * as scene from '@/app/api/scenes/[id]/route';
import * as restore from '@/app/api/scenes/[id]/restore/route';
import * as archive from '@/app/api/scenes/[id]/archive/route';
import * as duplicate from '@/app/api/scenes/[id]/duplicate/route';
import * as deleted from '@/app/api/scenes/deleted/route';
import { getDb } from '@/db';
import { daysLeftToRestore, copyTitle } from '@/lib/scene/retention';

const COIL = 'Coil transfer, Route 9 weigh station';
const REEFER = 'Overturned reefer trailer, Mill Creek on-ramp';

const idOf = async (title: string) => (await getDb().selectFrom('scenes').select('id').where('title', '=', title).executeTakeFirstOrThrow()).id;
const listedTitles = async (query = 'pageSize=100') => ((await call({ handler: scenes.GET, method: 'GET', query })).json.items as { title: string }[]).map((s) => s.title);

beforeAll(async () => {
  await freshSeededDb();
});

describe('delete, then restore', () => {
  it('a deleted scene leaves the list and answers 404; an admin sees it under Recently deleted and restores it', async () => {
    const id = await idOf(COIL);
    signInAs(await demoUser('operator@harrow.example'));
    expect((await call({ handler: scene.DELETE, method: 'DELETE', id: String(id) })).status).toBe(200);
    expect(await listedTitles()).not.toContain(COIL);
    expect((await call({ handler: scene.GET, method: 'GET', id: String(id) })).status).toBe(404);
    // The operator may not restore it: only admins do.
    expect((await call({ handler: restore.POST, method: 'POST', id: String(id) })).status).toBe(403);

    signInAs(await demoUser('admin@harrow.example'));
    const bin = await call({ handler: deleted.GET, method: 'GET' });
    expect(bin.json.restoreWindowDays).toBe(30);
    const entry = (bin.json.items as { id: number; title: string; daysLeft: number; ownerName: string }[]).find((s) => s.id === id);
    expect(entry).toMatchObject({ title: COIL, daysLeft: 29 });
    const back = await call({ handler: restore.POST, method: 'POST', id: String(id) });
    expect(back.status).toBe(200);
    expect(back.json).toMatchObject({ id, title: COIL });
    expect(await listedTitles()).toContain(COIL);
    expect(((await call({ handler: deleted.GET, method: 'GET' })).json.items as { id: number }[]).map((s) => s.id)).not.toContain(id);
    // Restoring twice finds nothing to restore.
    expect((await call({ handler: restore.POST, method: 'POST', id: String(id) })).status).toBe(404);
    const actions = await getDb().selectFrom('audit_log').select('action').where('scene_id', '=', id).orderBy('id').execute();
    expect(actions.map((a) => a.action).slice(-2)).toEqual(['scene.delete', 'scene.restore']);
  });

  it('the restore window is 30 days: whole days left count down to 0', () => {
    const now = new Date('2026-12-02T12:00:00Z');
    expect(daysLeftToRestore('2026-12-02T12:00:00Z', now)).toBe(30);
    expect(daysLeftToRestore('2026-11-02T12:00:01Z', now)).toBe(0);
    expect(daysLeftToRestore('2026-11-03T12:00:01Z', now)).toBe(1);
    expect(daysLeftToRestore('2026-11-01T12:00:00Z', now)).toBe(0);
  });
});

describe('archive and unarchive', () => {
  it('an archived scene leaves the default list, shows under status=archived, and unarchiving gives back its status', async () => {
    const id = await idOf(REEFER);
    signInAs(await demoUser('admin@harrow.example'));
    const before = await call({ handler: scene.GET, method: 'GET', id: String(id) });
    expect(before.json.status).toBe('approved');
    const out = await call({ handler: archive.PUT, method: 'PUT', id: String(id), body: { archived: true } });
    expect(out.status).toBe(200);
    expect(out.json).toMatchObject({ status: 'archived', revision: before.json.revision });
    expect(await listedTitles()).not.toContain(REEFER);
    expect(await listedTitles('pageSize=100&status=archived')).toEqual([REEFER]);
    // An archived plan cannot be edited.
    signInAs(await demoUser('operator@harrow.example'));
    expect((await call({ handler: scene.PUT, method: 'PUT', id: String(id), body: { revision: before.json.revision, title: 'Changed' } })).status).toBe(409);
    const back = await call({ handler: archive.PUT, method: 'PUT', id: String(id), body: { archived: false } });
    expect(back.status).toBe(200);
    expect(back.json.status).toBe('approved');
    expect(await listedTitles()).toContain(REEFER);
  });

  it('refuses a body without a boolean, naming the field', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const res = await call({ handler: archive.PUT, method: 'PUT', id: String(await idOf(REEFER)), body: { archived: 'yes' } });
    expect(res.status).toBe(400);
    expect(res.json.issues?.[0]?.path).toBe('archived');
  });
});

describe('duplicate', () => {
  it('copies the sketch, location and truck into a new draft of the operator’s own at revision 1', async () => {
    const id = await idOf(REEFER);
    signInAs(await demoUser('operator@harrow.example'));
    const source = (await call({ handler: scene.GET, method: 'GET', id: String(id) })).json;
    const res = await call({ handler: duplicate.POST, method: 'POST', id: String(id), body: {} });
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ title: copyTitle(REEFER), status: 'draft', revision: 1, location: source.location, equipmentProfileId: source.equipmentProfileId, inTrainingSet: false });
    expect(res.json.id).not.toBe(id);
    expect(res.json.document).toEqual(source.document);
    const named = await call({ handler: duplicate.POST, method: 'POST', id: String(id), body: { title: 'Reefer, second attempt' } });
    expect(named.json.title).toBe('Reefer, second attempt');
    const bad = await call({ handler: duplicate.POST, method: 'POST', id: String(id), body: { title: 'x' } });
    expect(bad.status).toBe(400);
    expect(bad.json.issues?.[0]?.path).toBe('title');
  });
});
