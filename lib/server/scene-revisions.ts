import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { getScene, listRevisions } from '@/db/repositories/scenes';
import { listSubmissions } from '@/db/repositories/submissions';
import type { SubmissionState } from '@/db/schema';
import { headlineFigures, type RevisionSummary } from '@/lib/replay/headline-figures';

export type { RevisionSummary };
import { analyseSavedScene, type SavedAnalysis } from './scene-analysis';

/** The timeline shows the newest saves; autosave makes many, and each needs the engine once. */
export const REVISION_LIST_LIMIT = 100;

/** What a review decided about an earlier revision, in the words of the scene statuses. */
const DECIDED: Record<SubmissionState, string> = { pending: 'submitted', approved: 'approved', returned: 'returned', withdrawn: 'withdrawn' };

const problemOf = (a: SavedAnalysis) => (a.ok ? null : { code: a.code, message: a.message });

/** A readable scene's revisions, newest first, with figures the server computed; undefined when unreadable. */
export async function listRevisionSummaries(db: Kysely<Database>, user: CurrentUser, sceneId: number): Promise<RevisionSummary[] | undefined> {
  const scene = await getScene(db, user, sceneId);
  if (!scene) return undefined;
  const rows = (await listRevisions(db, user.organisationId, sceneId)).slice(0, REVISION_LIST_LIMIT);
  // Newest submission first, so the first one met for a revision is the latest decision on it.
  const decided = new Map<number, string>();
  for (const s of await listSubmissions(db, user.organisationId, sceneId)) if (!decided.has(s.revision)) decided.set(s.revision, DECIDED[s.state]);
  const out: RevisionSummary[] = [];
  for (const r of rows) {
    const found = await analyseSavedScene(db, user, sceneId, r.revision);
    const analysis = found.kind === 'done' ? found.analysis : null;
    out.push({
      revision: r.revision,
      savedAt: r.created_at,
      author: r.author_name,
      status: r.revision === scene.revision ? scene.status : (decided.get(r.revision) ?? 'superseded'),
      figures: analysis?.ok ? headlineFigures(analysis.result) : null,
      problem: analysis ? problemOf(analysis) : null,
    });
  }
  return out;
}

export type RevisionDetail = { kind: 'missing' } | { kind: 'no-revision'; latest: number } | { kind: 'ok'; body: Record<string, unknown> };

/** One revision: its stored document and the engine's result for it (null with `problem` when there is none). */
export async function revisionDetail(db: Kysely<Database>, user: CurrentUser, sceneId: number, revision: number): Promise<RevisionDetail> {
  const found = await analyseSavedScene(db, user, sceneId, revision);
  if (found.kind !== 'done') return found;
  const row = await db
    .selectFrom('scene_revisions')
    .innerJoin('users', 'users.id', 'scene_revisions.author_id')
    .select(['scene_revisions.document', 'scene_revisions.created_at', 'users.name as author_name'])
    .where('scene_revisions.scene_id', '=', sceneId)
    .where('scene_revisions.revision', '=', revision)
    .executeTakeFirstOrThrow();
  const a = found.analysis;
  return {
    kind: 'ok',
    body: {
      revision,
      savedAt: row.created_at,
      author: row.author_name,
      document: row.document,
      analysis: a.ok ? { ...a.meta, names: a.names, ...a.result } : null,
      figures: a.ok ? headlineFigures(a.result) : null,
      problem: problemOf(a),
    },
  };
}
