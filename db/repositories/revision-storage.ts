import { gzipSync } from 'node:zlib';
import { sql, type Kysely } from 'kysely';
import type { Database } from '../schema';
import { isPostgres, type HasExecutor } from '../dialect';

type Db = Kysely<Database>;

/**
 * How a saved revision is stored, and how autosave revisions are thinned.
 *
 * - An autosave's snapshot is gzip-compressed (a scene document shrinks to roughly a tenth); the scene row
 *   keeps the current document as JSON for fast reads.
 * - A revision that is submitted or approved is `kept`: rewritten as a full JSON snapshot and never thinned.
 * - Thinning policy: every revision of the last 24 hours stays; older autosaves keep one per clock hour (the
 *   newest of that hour). Kept revisions, the scene's current revision, and any revision a lesson step or the
 *   plan details point at are never removed. It runs after a save has answered, never inside it.
 */

export const KEEP_ALL_FOR_MS = 24 * 60 * 60 * 1000;

export function compressedSnapshot(document: Record<string, unknown> | string): Buffer {
  return gzipSync(typeof document === 'string' ? document : JSON.stringify(document), { level: 6 });
}

/**
 * A full (uncompressed) JSON snapshot as the revision column takes it: text on SQLite, the JSON's UTF-8
 * bytes on PostgreSQL, where the column is bytea (migrations/2026-12-02T14-30_revision-storage.ts).
 */
export function fullSnapshot(db: HasExecutor, document: Record<string, unknown> | string): string | Buffer {
  const json = typeof document === 'string' ? document : JSON.stringify(document);
  return isPostgres(db) ? Buffer.from(json, 'utf8') : json;
}

/** Marks a revision as kept (submitted or approved) and stores it as a full JSON snapshot. */
export async function keepRevision(db: Db, sceneId: number, revision: number): Promise<boolean> {
  const row = await db.selectFrom('scene_revisions').select(['id', 'document']).where('scene_id', '=', sceneId).where('revision', '=', revision).executeTakeFirst();
  if (!row) return false;
  await db.updateTable('scene_revisions').set({ kept: 1, document: fullSnapshot(db, row.document) }).where('id', '=', row.id).execute();
  return true;
}

/** Removes autosave revisions of one scene that the policy no longer keeps; returns how many went. */
export async function thinRevisions(db: Db, sceneId: number, now: Date = new Date()): Promise<number> {
  const cutoff = new Date(now.getTime() - KEEP_ALL_FOR_MS).toISOString();
  // Within each clock hour before the cutoff, every autosave but the newest goes, unless something points at it.
  const res = await sql`
    delete from scene_revisions
    where scene_id = ${sceneId}
      and kept = 0
      and created_at < ${cutoff}
      and revision < (select revision from scenes where id = ${sceneId})
      and revision not in (select revision from lesson_steps where scene_id = ${sceneId})
      and revision not in (select revision from scene_plan_details where scene_id = ${sceneId})
      and exists (
        select 1 from scene_revisions newer
        where newer.scene_id = scene_revisions.scene_id
          and substr(newer.created_at, 1, 13) = substr(scene_revisions.created_at, 1, 13)
          and newer.revision > scene_revisions.revision
      )`.execute(db);
  return Number(res.numAffectedRows ?? 0);
}

const lastThinned = new Map<number, number>();
/** A scene is thinned at most this often; saves in between cost nothing. */
const THIN_EVERY_MS = 10 * 60 * 1000;

/**
 * Thins a scene's revisions in the background after a save: scheduled on the next turn of the event loop,
 * so the save has already answered, and at most once per scene every ten minutes. A failure is logged and
 * retried at the next save; it never reaches the user.
 */
export function scheduleThinning(db: Db, sceneId: number): void {
  const last = lastThinned.get(sceneId) ?? 0;
  if (Date.now() - last < THIN_EVERY_MS) return;
  lastThinned.set(sceneId, Date.now());
  setTimeout(() => {
    thinRevisions(db, sceneId).catch((err) => {
      lastThinned.delete(sceneId);
      // A test that closed its database before the timer fired: nothing to thin, nothing to report.
      if (/destroyed/.test(String((err as Error)?.message))) return;
      console.error(`revision thinning for scene ${sceneId} failed`, err);
    });
  }, 0).unref?.();
}
