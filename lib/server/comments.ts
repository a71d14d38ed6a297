import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { inTransaction } from '@/db/transaction';
import { getScene } from '@/db/repositories/scenes';
import { recordAudit } from '@/db/repositories/audit';
import { findComment, insertComment, listComments, setCommentResolved, type CommentAnchor, type SceneComment } from '@/db/repositories/comments';
import { usersWithRole } from '@/db/repositories/notifications';
import { findUserById } from '@/db/repositories/users';
import type { CurrentUser } from '@/lib/domain';
import { insideExtent, objectIds, sceneExtent } from '@/lib/review/extent';
import { mayComment } from '@/lib/review/permissions';
import type { Outcome } from './review';
import { notifyPeople, type Recipient } from './review-notify';
import { kickOutbox } from './mail/outbox-worker';

type Db = Kysely<Database>;
const fail = (status: number, error: string, path?: string): Outcome => ({ status, body: { error, ...(path ? { issues: [{ path, message: error }] } : {}) } });

export interface CommentThread extends SceneComment {
  replies: SceneComment[];
}

/** Threads (a pinned or general comment with its replies), oldest first. */
export async function commentThreads(db: Db, user: CurrentUser, sceneId: number): Promise<CommentThread[] | null> {
  const scene = await getScene(db, user, sceneId);
  if (!scene) return null;
  const all = await listComments(db, user.organisationId, sceneId);
  return all.filter((c) => c.parentId === null).map((c) => ({ ...c, replies: all.filter((r) => r.parentId === c.id) }));
}

export interface NewCommentInput {
  body: string;
  anchor?: CommentAnchor;
  parentId?: number;
}

export async function addComment(db: Db, user: CurrentUser, sceneId: number, input: NewCommentInput): Promise<Outcome> {
  const scene = await getScene(db, user, sceneId);
  if (!scene) return fail(404, 'Scene not found');
  if (!mayComment(user, scene)) return fail(403, 'Only the plan’s operator and the organisation’s supervisors and admins comment on it');
  let parent: SceneComment | undefined;
  if (input.parentId !== undefined) {
    parent = await findComment(db, user.organisationId, sceneId, input.parentId);
    if (!parent) return fail(422, 'parentId: no such comment on this scene', 'parentId');
    if (parent.parentId !== null) return fail(422, 'parentId: reply to the thread’s first comment', 'parentId');
    if (input.anchor) return fail(422, 'anchor: a reply sits in its thread; only a new comment is pinned', 'anchor');
  }
  const anchor = input.anchor ?? null;
  if (anchor && 'x' in anchor && !insideExtent(sceneExtent(scene.document), anchor)) return fail(422, 'anchor: the pin is outside the scene’s extent', 'anchor');
  if (anchor && 'objectId' in anchor && !objectIds(scene.document).has(anchor.objectId)) return fail(422, `anchor.objectId: the plan has no object "${anchor.objectId}"`, 'anchor.objectId');
  const id = await inTransaction(db, async (trx) => {
    const commentId = await insertComment(trx, { organisationId: user.organisationId, sceneId, authorId: user.id, parentId: parent?.id ?? null, revision: scene.revision, body: input.body, anchor });
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId, action: parent ? 'comment.reply' : 'comment.create', detail: { commentId, revision: scene.revision, ...(parent ? { parentId: parent.id } : {}), pinned: anchor !== null } });
    // The other side: the plan's operator hears from reviewers; the reviewers hear from the operator.
    const fromOwner = user.id === scene.ownerId;
    const owner = (await findUserById(trx, scene.ownerId))!;
    const recipients: Recipient[] = fromOwner ? await usersWithRole(trx, user.organisationId, ['supervisor']) : [{ id: owner.id, email: owner.email }];
    await notifyPeople(trx, {
      organisationId: user.organisationId, sceneId, kind: 'comment', path: fromOwner ? `/scenes/${sceneId}/review` : `/scenes/${sceneId}`,
      message: `${user.name} commented on “${scene.title}”`,
      recipients: recipients.filter((r) => r.id !== user.id),
      mail: { subject: `Comment on ${scene.title}`, lead: `${user.name} ${parent ? 'replied' : 'commented'} on the lift plan “${scene.title}”.`, quotes: [{ label: 'Comment', text: input.body }], linkLabel: 'Open the plan' },
    });
    return commentId;
  });
  kickOutbox();
  return { status: 201, body: (await findComment(db, user.organisationId, sceneId, id)) as unknown as Record<string, unknown> };
}

export async function resolveComment(db: Db, user: CurrentUser, sceneId: number, commentId: number, resolved: boolean): Promise<Outcome> {
  const scene = await getScene(db, user, sceneId);
  if (!scene) return fail(404, 'Scene not found');
  const comment = await findComment(db, user.organisationId, sceneId, commentId);
  if (!comment) return fail(404, 'Comment not found');
  if (!mayComment(user, scene)) return fail(403, 'Only the plan’s operator and the organisation’s supervisors and admins resolve comments');
  if (comment.resolved !== resolved) {
    await inTransaction(db, async (trx) => {
      await setCommentResolved(trx, commentId, resolved ? user.id : null);
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId, action: resolved ? 'comment.resolve' : 'comment.reopen', detail: { commentId } });
    });
  }
  return { status: 200, body: (await findComment(db, user.organisationId, sceneId, commentId)) as unknown as Record<string, unknown> };
}
