import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { DB } from '@/db';
import { createScene, getScene, getSceneAsJson, listRevisions, setTrainingSet, softDeleteScene, updateScene } from '@/db/repositories/scenes';
import { listScenes } from '@/db/repositories/scene-list';
import { listSceneAudit } from '@/db/repositories/audit';
import { inTransaction } from '@/db/transaction';
import type { CurrentUser } from '@/lib/auth/current-user';
import { demoUser } from '@/tests/setup/db';
import { buildTemplate, resetToTemplate } from '@/tests/setup/template-db';
import { rowCount, snapshotDb } from '@/tests/setup/snapshot';

let template: string;
let db: DB;
let op: CurrentUser, sup: CurrentUser, admin: CurrentUser, other: CurrentUser;
const doc = (n: number) => ({ version: 1, objects: [{ kind: 'tape', length: n }] });

beforeAll(async () => {
  template = await buildTemplate();
});
beforeEach(async () => {
  db = await resetToTemplate(template);
  [op, sup, admin, other] = await Promise.all(
    ['operator@harrow.example', 'supervisor@harrow.example', 'admin@harrow.example', 'operator@cobalt.example'].map((e) => demoUser(e as never)),
  );
});

describe('createScene', () => {
  it('writes the scene at revision 1, its first revision row and an audit row', async () => {
    const s = await createScene(db, op, { title: 'Tanker on its side, Dell Road', document: doc(3) });
    expect(s).toMatchObject({ title: 'Tanker on its side, Dell Road', revision: 1, status: 'draft', ownerId: op.id, ownerName: 'Dana Okafor', organisationId: op.organisationId, document: doc(3), inTrainingSet: false });
    const revs = await db.selectFrom('scene_revisions').selectAll().where('scene_id', '=', s.id).execute();
    expect(revs.map((r) => [r.revision, r.author_id, r.document])).toEqual([[1, op.id, doc(3)]]);
    const audit = await listSceneAudit(db, op.organisationId, s.id);
    expect(audit.map((a) => [a.action, a.user_name, a.detail])).toEqual([['scene.create', 'Dana Okafor', { title: 'Tanker on its side, Dell Road' }]]);
  });

  it('leaves nothing behind when the transaction it joined fails', async () => {
    const before = await snapshotDb(db);
    await expect(
      inTransaction(db, async (trx) => {
        await createScene(trx, op, { title: 'Rolled back', document: doc(1) });
        throw new Error('later step failed');
      }),
    ).rejects.toThrow('later step failed');
    expect(await snapshotDb(db)).toEqual(before);
  });
});

describe('updateScene', () => {
  it('bumps the revision, stores the new document as a revision row and audits the changed fields only', async () => {
    const s = await createScene(db, op, { title: 'Coil move', document: doc(1) });
    const out = await updateScene(db, op, s.id, { revision: 1, document: doc(2), title: undefined });
    expect(out.kind).toBe('ok');
    if (out.kind !== 'ok') return;
    expect(out.revision).toBe(2);
    const saved = (await getScene(db, op, s.id))!;
    expect(saved.title).toBe('Coil move');
    expect(saved.document).toEqual(doc(2));
    expect(saved.updatedAt).toBe(out.savedAt);
    expect((await listRevisions(db, op.organisationId, s.id)).map((r) => r.revision)).toEqual([2, 1]);
    const stored = await db.selectFrom('scene_revisions').select('document').where('scene_id', '=', s.id).where('revision', '=', 2).executeTakeFirstOrThrow();
    expect(stored.document).toEqual(doc(2));
    const audit = await listSceneAudit(db, op.organisationId, s.id);
    expect(audit[0]).toMatchObject({ action: 'scene.update', detail: { revision: 2, fields: ['document'] } });
  });

  it('refuses a stale revision with the current one and writes nothing', async () => {
    const s = await createScene(db, op, { title: 'Coil move', document: doc(1) });
    await updateScene(db, op, s.id, { revision: 1, title: 'First save wins' });
    const before = await snapshotDb(db);
    expect(await updateScene(db, op, s.id, { revision: 1, title: 'Second save loses' })).toEqual({ kind: 'stale', current: 2 });
    expect(await snapshotDb(db)).toEqual(before);
    expect((await getScene(db, op, s.id))!.title).toBe('First save wins');
  });

  it('answers missing, not the revision, for another organisation’s scene or a deleted one', async () => {
    const s = await createScene(db, op, { title: 'Coil move', document: doc(1) });
    const before = await snapshotDb(db);
    expect(await updateScene(db, other, s.id, { revision: 1, title: 'Cross-org write' })).toEqual({ kind: 'missing' });
    expect(await snapshotDb(db)).toEqual(before);
    await softDeleteScene(db, op, s.id);
    expect(await updateScene(db, op, s.id, { revision: 1, title: 'Write after delete' })).toEqual({ kind: 'missing' });
  });
});

describe('softDeleteScene', () => {
  it('hides the scene from reads and lists, keeps the row, audits once, and is false the second time', async () => {
    const s = await createScene(db, op, { title: 'Short-lived plan', document: doc(1) });
    expect(await softDeleteScene(db, op, s.id)).toBe(true);
    expect(await getScene(db, sup, s.id)).toBeUndefined();
    expect((await listScenes(db, sup, { pageSize: 50 })).items.map((i) => i.id)).not.toContain(s.id);
    const row = await db.selectFrom('scenes').select('deleted_at').where('id', '=', s.id).executeTakeFirstOrThrow();
    expect(row.deleted_at).toMatch(/^\d{4}-\d\d-\d\dT/);
    expect(await softDeleteScene(db, admin, s.id)).toBe(false);
    expect((await listSceneAudit(db, op.organisationId, s.id)).map((a) => a.action)).toEqual(['scene.delete', 'scene.create']);
  });

  it('cannot delete across organisations', async () => {
    const s = await createScene(db, op, { title: 'Harrow plan', document: doc(1) });
    expect(await softDeleteScene(db, other, s.id)).toBe(false);
    expect(await getScene(db, op, s.id)).toBeDefined();
  });
});

describe('listScenes and getScene', () => {
  it('shows an operator their own scenes and approved ones; a supervisor every organisation scene', async () => {
    const supMade = await createScene(db, sup, { title: 'Draft written by the supervisor', document: doc(1) });
    const titles = async (u: CurrentUser) => (await listScenes(db, u, { pageSize: 50 })).items.map((i) => i.title).sort();
    expect(await titles(op)).toEqual(['Coil transfer, Route 9 weigh station', 'Overturned reefer trailer, Mill Creek on-ramp']);
    expect(await titles(sup)).toEqual([
      'Coil transfer, Route 9 weigh station',
      'Draft written by the supervisor',
      'Loaded livestock trailer on its side, Pell Lane',
      'Overturned reefer trailer, Mill Creek on-ramp',
      'Pipe bundle onto the low-loader, Station Road yard',
      'Tipped grain trailer, Kestrel Lane',
    ]);
    expect(await titles(other)).toEqual(['Box truck up the embankment, Quarry Road']);
    expect(await getScene(db, op, supMade.id)).toBeUndefined();
    await db.updateTable('scenes').set({ status: 'approved' }).where('id', '=', supMade.id).execute();
    expect((await getScene(db, op, supMade.id))?.title).toBe('Draft written by the supervisor');
  });

  it('searches (case-insensitive, no SQL wildcards) and filters by status, and pages with a total', async () => {
    for (let i = 1; i <= 5; i++) await createScene(db, op, { title: `Paging scene ${i}`, document: doc(i) });
    await createScene(db, op, { title: '100% grade pull', document: doc(9) });
    const page1 = await listScenes(db, op, { pageSize: 2, q: 'PAGING' });
    const page2 = await listScenes(db, op, { pageSize: 2, q: 'PAGING', after: page1.nextCursor! });
    expect(page2.total).toBe(5);
    expect(page2.items).toHaveLength(2);
    expect((await listScenes(db, op, { pageSize: 50, q: '%' })).items).toEqual([]);
    expect((await listScenes(db, op, { pageSize: 50, q: '100%' })).items.map((i) => i.title)).toEqual(['100% grade pull']);
    expect((await listScenes(db, op, { pageSize: 50, status: 'approved' })).items.map((i) => i.title)).toEqual(['Overturned reefer trailer, Mill Creek on-ramp']);
    const sorted = await listScenes(db, op, { pageSize: 3, q: 'paging', sort: 'title', dir: 'asc' });
    expect(sorted.items.map((i) => i.title)).toEqual(['Paging scene 1', 'Paging scene 2', 'Paging scene 3']);
  });

  it('lists no revisions of another organisation’s scene', async () => {
    const s = await createScene(db, op, { title: 'Harrow plan', document: doc(1) });
    expect(await listRevisions(db, other.organisationId, s.id)).toEqual([]);
    expect(await listRevisions(db, op.organisationId, s.id)).toHaveLength(1);
  });
});

describe('getSceneAsJson (the single-scene GET)', () => {
  it('answers exactly what getScene gives, the stored document spliced in as text, and nothing a reader may not see', async () => {
    const document = { version: 1, grid: 2.5, objects: [{ kind: 'tape', length: 3, label: 'Château "ramp" \\ ✓\n' }, { kind: 'tape', length: 1e-7 }] };
    const s = await createScene(db, op, { title: 'Spliced reefer', location: 'Mile 3', notes: null, document });
    await updateScene(db, op, s.id, { revision: 1, document: { ...document, grid: 3 } });
    for (const reader of [op, sup, admin]) {
      const text = await getSceneAsJson(db, reader, s.id);
      expect(text).toBeDefined();
      expect(JSON.parse(text!)).toEqual(await getScene(db, reader, s.id));
    }
    expect(JSON.parse((await getSceneAsJson(db, op, s.id))!).document).toEqual({ ...document, grid: 3 });
    // Another organisation, and a deleted scene, read nothing.
    expect(await getSceneAsJson(db, other, s.id)).toBeUndefined();
    await softDeleteScene(db, op, s.id);
    expect(await getSceneAsJson(db, op, s.id)).toBeUndefined();
  });
});

describe('setTrainingSet', () => {
  it('flags the scene without a new revision and audits; another organisation’s id changes nothing', async () => {
    const trainer = await demoUser('trainer@harrow.example');
    const s = await createScene(db, op, { title: 'Class example', document: doc(1) });
    expect(await setTrainingSet(db, trainer, s.id, true)).toBe(true);
    const row = await db.selectFrom('scenes').select(['in_training_set', 'revision']).where('id', '=', s.id).executeTakeFirstOrThrow();
    expect(row).toEqual({ in_training_set: 1, revision: 1 });
    const audits = await rowCount('audit_log', db);
    const before = await snapshotDb(db);
    expect(await setTrainingSet(db, other, s.id, false)).toBe(false);
    expect(await snapshotDb(db)).toEqual(before);
    expect(await rowCount('audit_log', db)).toBe(audits);
  });
});
