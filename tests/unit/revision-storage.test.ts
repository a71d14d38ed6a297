import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { sql } from 'kysely';
import type { DB } from '@/db';
import { isPostgres } from '@/db/dialect';
import { createScene, updateScene } from '@/db/repositories/scenes';
import { KEEP_ALL_FOR_MS, keepRevision, thinRevisions } from '@/db/repositories/revision-storage';
import type { CurrentUser } from '@/lib/auth/current-user';
import { demoUser } from '@/tests/setup/db';
import { buildTemplate, resetToTemplate } from '@/tests/setup/template-db';

let template: string;
let db: DB;
let op: CurrentUser;

beforeAll(async () => {
  template = await buildTemplate();
});
beforeEach(async () => {
  db = await resetToTemplate(template);
  op = await demoUser('operator@harrow.example');
});

/** A document of realistic bulk: 200 obstacles with names and outlines. */
const bigDoc = (n: number) => ({
  version: 1,
  objects: Array.from({ length: 200 }, (_, i) => ({ id: `obstacle-${i}`, kind: 'obstacle', name: `Barrier section ${i}`, height: 1.1, polygon: [[i, n], [i + 1, n], [i + 1, n + 0.4], [i, n + 0.4]] })),
});

/** Saves `count` revisions of a scene, then dates revision r at `when(r)`. */
async function sceneWithHistory(count: number, when: (revision: number) => Date) {
  const s = await createScene(db, op, { title: 'History scene', document: bigDoc(0) });
  for (let r = 1; r < count; r++) await updateScene(db, op, s.id, { revision: r, document: bigDoc(r) });
  for (let r = 1; r <= count; r++) await db.updateTable('scene_revisions').set({ created_at: when(r).toISOString() }).where('scene_id', '=', s.id).where('revision', '=', r).execute();
  return s.id;
}

/** The revision column as stored (aliased, so db/json-columns.ts leaves it alone): text, or bytes. */
const storedDocument = async (sceneId: number, revision: number) =>
  (await sql<{ raw: string | Uint8Array; kept: number }>`select document as raw, kept from scene_revisions where scene_id = ${sceneId} and revision = ${revision}`.execute(db)).rows[0];
const isGzip = (v: unknown) => v instanceof Uint8Array && v[0] === 0x1f && v[1] === 0x8b;

const revisionsOf = async (sceneId: number) =>
  (await db.selectFrom('scene_revisions').select('revision').where('scene_id', '=', sceneId).orderBy('revision').execute()).map((r) => r.revision);

describe('revision storage', () => {
  it('stores an autosave compressed and reads it back as the same document', async () => {
    const s = await createScene(db, op, { title: 'Compressed', document: bigDoc(0) });
    await updateScene(db, op, s.id, { revision: 1, document: bigDoc(1) });
    const { raw } = await storedDocument(s.id, 2);
    expect(isGzip(raw)).toBe(true);
    // gzip of a repetitive document: far under half its JSON size.
    expect(raw.length).toBeLessThan(JSON.stringify(bigDoc(1)).length / 4);
    const read = await db.selectFrom('scene_revisions').select('document').where('scene_id', '=', s.id).where('revision', '=', 2).executeTakeFirstOrThrow();
    expect(read.document).toEqual(bigDoc(1));
  });

  it('keeps a submitted revision as full JSON', async () => {
    const s = await createScene(db, op, { title: 'Kept', document: bigDoc(0) });
    await updateScene(db, op, s.id, { revision: 1, document: bigDoc(1) });
    expect(await keepRevision(db, s.id, 2)).toBe(true);
    const stored = await storedDocument(s.id, 2);
    expect(stored.kept).toBe(1);
    // JSON text on SQLite; on PostgreSQL (a bytea column) the JSON's UTF-8 bytes, not gzip.
    if (isPostgres(db)) {
      expect(isGzip(stored.raw)).toBe(false);
      expect(JSON.parse(Buffer.from(stored.raw as Uint8Array).toString('utf8'))).toEqual(bigDoc(1));
    } else {
      expect(typeof stored.raw).toBe('string');
      expect(JSON.parse(stored.raw as string)).toEqual(bigDoc(1));
    }
    expect(await keepRevision(db, s.id, 99)).toBe(false);
  });
});

describe('thinning policy', () => {
  const now = new Date('2026-12-02T12:00:00.000Z');
  const hoursAgo = (h: number) => new Date(now.getTime() - h * 3600_000);

  it('keeps every revision of the last day, then one per clock hour (the newest), and the current one', async () => {
    // Revisions 1–6 two days ago, all within one clock hour; 7–9 in the next hour; 10–12 within the last day.
    const at = (r: number) => (r <= 6 ? new Date(hoursAgo(48).getTime() + r * 60_000) : r <= 9 ? new Date(hoursAgo(47).getTime() + r * 60_000) : hoursAgo(12 - r));
    const id = await sceneWithHistory(12, at);
    expect(await thinRevisions(db, id, now)).toBe(7);
    expect(await revisionsOf(id)).toEqual([6, 9, 10, 11, 12]);
    // Running again removes nothing more.
    expect(await thinRevisions(db, id, now)).toBe(0);
  });

  it('never removes a submitted or approved revision, nor one a lesson or the plan details point at', async () => {
    const id = await sceneWithHistory(8, (r) => new Date(hoursAgo(72).getTime() + r * 60_000));
    await keepRevision(db, id, 2); // submitted
    await keepRevision(db, id, 3); // approved
    await db.insertInto('scene_plan_details').values({ organisation_id: op.organisationId, scene_id: id, revision: 4, details: '{}', author_id: op.id, created_at: now.toISOString() } as never).execute();
    expect(await thinRevisions(db, id, now)).toBe(4);
    expect(await revisionsOf(id)).toEqual([2, 3, 4, 8]);
  });

  it('leaves a scene whose history is all within the last day alone', async () => {
    const id = await sceneWithHistory(5, (r) => new Date(now.getTime() - KEEP_ALL_FOR_MS + r * 60_000));
    expect(await thinRevisions(db, id, now)).toBe(0);
    expect(await revisionsOf(id)).toEqual([1, 2, 3, 4, 5]);
  });
});
