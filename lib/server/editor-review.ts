import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import type { Scene } from '@/db/repositories/scenes';
import { listSubmissions } from '@/db/repositories/submissions';
import type { CurrentUser } from '@/lib/domain';
import type { EditorReviewData, ThreadView } from '@/lib/review/page-data';
import { isReviewer, mayComment, mayManagePlan } from '@/lib/review/permissions';
import { commentThreads } from './comments';

/** The review desk's part of the editor page, for a scene the caller has already loaded for this user. */
export async function editorReviewData(db: Kysely<Database>, user: CurrentUser, scene: Scene): Promise<EditorReviewData> {
  const [subs, threads] = await Promise.all([listSubmissions(db, user.organisationId, scene.id), commentThreads(db, user, scene.id)]);
  const decided = subs.find((s) => s.state === 'approved' || s.state === 'returned');
  return {
    status: scene.status,
    mayManage: mayManagePlan(user, scene),
    mayComment: mayComment(user, scene),
    reviewer: isReviewer(user.role),
    threads: (threads ?? []) as ThreadView[],
    lastDecision: decided
      ? { state: decided.state as 'approved' | 'returned', revision: decided.revision, byName: decided.decidedByName, at: decided.decidedAt, note: decided.note, conditions: decided.conditions }
      : null,
  };
}
