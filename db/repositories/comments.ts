import type { Kysely } from 'kysely';
import type { Database, SceneCommentRow } from '../schema';
import type { CommentView } from '@/lib/review/page-data';

type Db = Kysely<Database>;

/** A comment as the routes answer it; the shape is the review desk's (lib/review/page-data). */
export type SceneComment = CommentView;
export type CommentAnchor = CommentView['anchor'];

type Row = SceneCommentRow & { author_name: string; author_role: string; resolved_by_name: string | null };

function toComment(r: Row): SceneComment {
  const anchor: CommentAnchor =
    r.anchor_object_id !== null ? { objectId: r.anchor_object_id } : r.anchor_x !== null && r.anchor_y !== null ? { x: r.anchor_x, y: r.anchor_y } : null;
  return {
    id: r.id,
    sceneId: r.scene_id,
    parentId: r.parent_id,
    revision: r.revision,
    authorId: r.author_id,
    authorName: r.author_name,
    authorRole: r.author_role,
    body: r.body,
    anchor,
    resolved: r.resolved_at !== null,
    resolvedAt: r.resolved_at,
    resolvedByName: r.resolved_by_name,
    createdAt: r.created_at,
  };
}

function comments(db: Db, organisationId: number, sceneId: number) {
  return db
    .selectFrom('scene_comments as c')
    .innerJoin('users as a', 'a.id', 'c.author_id')
    .leftJoin('users as r', 'r.id', 'c.resolved_by')
    .selectAll('c')
    .select(['a.name as author_name', 'a.role as author_role', 'r.name as resolved_by_name'])
    .where('c.organisation_id', '=', organisationId)
    .where('c.scene_id', '=', sceneId);
}

/** Every comment on a scene, oldest first (threads are put together by the caller). */
export async function listComments(db: Db, organisationId: number, sceneId: number): Promise<SceneComment[]> {
  return (await comments(db, organisationId, sceneId).orderBy('c.id', 'asc').execute()).map((r) => toComment(r as Row));
}

export async function findComment(db: Db, organisationId: number, sceneId: number, id: number): Promise<SceneComment | undefined> {
  const r = await comments(db, organisationId, sceneId).where('c.id', '=', id).executeTakeFirst();
  return r ? toComment(r as Row) : undefined;
}

export interface NewComment {
  organisationId: number;
  sceneId: number;
  authorId: number;
  parentId: number | null;
  revision: number;
  body: string;
  anchor: CommentAnchor;
}

export async function insertComment(db: Db, c: NewComment): Promise<number> {
  const point = c.anchor && 'x' in c.anchor ? c.anchor : null;
  const object = c.anchor && 'objectId' in c.anchor ? c.anchor.objectId : null;
  const row = await db
    .insertInto('scene_comments')
    .values({
      organisation_id: c.organisationId,
      scene_id: c.sceneId,
      author_id: c.authorId,
      parent_id: c.parentId,
      revision: c.revision,
      body: c.body,
      anchor_x: point?.x ?? null,
      anchor_y: point?.y ?? null,
      anchor_object_id: object,
      created_at: new Date().toISOString(),
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function setCommentResolved(db: Db, id: number, resolvedBy: number | null) {
  await db
    .updateTable('scene_comments')
    .set({ resolved_at: resolvedBy === null ? null : new Date().toISOString(), resolved_by: resolvedBy })
    .where('id', '=', id)
    .execute();
}

/** Open (unresolved) top-level comments on a scene. */
export async function countOpenComments(db: Db, organisationId: number, sceneId: number): Promise<number> {
  const r = await db
    .selectFrom('scene_comments')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where('organisation_id', '=', organisationId)
    .where('scene_id', '=', sceneId)
    .where('parent_id', 'is', null)
    .where('resolved_at', 'is', null)
    .executeTakeFirstOrThrow();
  return Number(r.n);
}
