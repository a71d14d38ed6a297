import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { getScene } from '@/db/repositories/scenes';
import { listSubmissions, type Submission } from '@/db/repositories/submissions';
import type { CurrentUser } from '@/lib/domain';
import type { Check } from '@/lib/lift';
import type { ReviewPageData, SubmissionView, ThreadView } from '@/lib/review/page-data';
import { planFigures, type PlanFigures } from '@/lib/review/figures';
import { decisionRefusal, mayComment } from '@/lib/review/permissions';
import { parseSceneDocument } from '@/lib/scene/parse';
import type { SceneDocument } from '@/lib/scene/schema';
import { loadSceneProfiles } from './load-profiles';
import { analyseSavedScene } from './scene-analysis';
import { commentThreads } from './comments';

type Db = Kysely<Database>;

const view = (s: Submission): SubmissionView => ({
  id: s.id, revision: s.revision, state: s.state, submittedByName: s.submittedByName, submittedAt: s.submittedAt, engineVersion: s.engineVersion,
  decidedByName: s.decidedByName, decidedAt: s.decidedAt, note: s.note, conditions: s.conditions, reason: s.reason,
});

async function documentAt(db: Db, sceneId: number, revision: number): Promise<SceneDocument | null> {
  const row = await db.selectFrom('scene_revisions').select('document').where('scene_id', '=', sceneId).where('revision', '=', revision).executeTakeFirst();
  if (!row) return null;
  const parsed = parseSceneDocument(row.document);
  return parsed.ok ? parsed.document : null;
}

/** Everything the review page shows, read and computed on the server; undefined when the scene is not the user's to see. */
export async function reviewPageData(db: Db, user: CurrentUser, sceneId: number): Promise<ReviewPageData | undefined> {
  const scene = await getScene(db, user, sceneId);
  if (!scene) return undefined;
  const subs = await listSubmissions(db, user.organisationId, sceneId);
  const current = subs.find((s) => s.state === 'pending') ?? subs.find((s) => s.state !== 'withdrawn') ?? null;
  const revision = current?.revision ?? scene.revision;
  const document = await documentAt(db, sceneId, revision);
  if (!document) return undefined;
  let figures = (current?.figures as unknown as PlanFigures | undefined) ?? null;
  let checks = (current?.checks as Check[] | undefined) ?? [];
  let problem: string | null = null;
  if (!current) {
    const found = await analyseSavedScene(db, user, sceneId, revision);
    if (found.kind === 'done' && found.analysis.ok) {
      figures = planFigures(found.analysis.result, found.analysis.input, found.analysis.names);
      checks = found.analysis.result.checks;
    } else problem = found.kind === 'done' && !found.analysis.ok ? found.analysis.message : 'The plan could not be computed';
  }
  const before = current ? subs.find((s) => s.id < current.id && (s.state === 'returned' || s.state === 'approved') && s.revision !== current.revision) : undefined;
  const beforeDoc = before ? await documentAt(db, sceneId, before.revision) : null;
  const profiles = await loadSceneProfiles(db, user.organisationId, document, null);
  if (beforeDoc) for (const p of await loadSceneProfiles(db, user.organisationId, beforeDoc, null)) if (!profiles.some((x) => x.id === p.id && x.version === p.version)) profiles.push(p);
  return {
    scene: { id: scene.id, title: scene.title, status: scene.status, revision: scene.revision, ownerId: scene.ownerId, ownerName: scene.ownerName },
    revision,
    document,
    submission: current ? view(current) : null,
    figures,
    checks,
    problem,
    previous: before && beforeDoc ? { submission: view(before), document: beforeDoc, figures: before.figures as unknown as PlanFigures } : null,
    history: subs.map(view),
    threads: ((await commentThreads(db, user, sceneId)) ?? []) as ThreadView[],
    profiles,
    decisionRefusal: current?.state !== 'pending' ? 'This plan has no submission awaiting a decision' : decisionRefusal(user, scene),
    mayComment: mayComment(user, scene),
  };
}
