import type { Kysely } from 'kysely';
import type { Database } from '../schema';
import type { CurrentUser, SceneStatus } from '@/lib/domain';
import { restorableSince } from '@/lib/scene/retention';
import { recordAudit } from './audit';
import { inTransaction } from '../transaction';
import { createScene, getScene, type Scene } from './scenes';

type Db = Kysely<Database>;

/** A deleted scene an admin may still restore. */
export interface DeletedScene {
  id: number;
  title: string;
  status: SceneStatus;
  ownerName: string;
  location: string | null;
  deletedAt: string;
}

/** The organisation's scenes deleted within the restore window, most recently deleted first. */
export async function listDeletedScenes(db: Db, user: CurrentUser): Promise<DeletedScene[]> {
  const rows = await db
    .selectFrom('scenes')
    .innerJoin('users', 'users.id', 'scenes.owner_id')
    .select(['scenes.id', 'scenes.title', 'scenes.status', 'scenes.location', 'scenes.deleted_at', 'users.name as owner_name'])
    .where('scenes.organisation_id', '=', user.organisationId)
    .where('scenes.deleted_at', 'is not', null)
    .where('scenes.deleted_at', '>=', restorableSince())
    .orderBy('scenes.deleted_at', 'desc')
    .orderBy('scenes.id', 'desc')
    .limit(500)
    .execute();
  return rows.map((r) => ({ id: r.id, title: r.title, status: r.status, ownerName: r.owner_name, location: r.location, deletedAt: r.deleted_at! }));
}

/** Brings back a scene deleted within the restore window; false when there is none such in the organisation. */
export async function restoreScene(db: Db, user: CurrentUser, id: number): Promise<boolean> {
  return inTransaction(db, async (trx) => {
    const res = await trx
      .updateTable('scenes')
      .set({ deleted_at: null })
      .where('id', '=', id)
      .where('organisation_id', '=', user.organisationId)
      .where('deleted_at', 'is not', null)
      .where('deleted_at', '>=', restorableSince())
      .executeTakeFirst();
    if (Number(res.numUpdatedRows) === 0) return false;
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId: id, action: 'scene.restore' });
    return true;
  });
}

/**
 * Archives a scene (status `archived`, remembering the status it had) or brings it back to that status.
 * Neither is a document change, so the revision stays. The caller has checked who may and the status.
 */
export async function setArchived(db: Db, user: CurrentUser, scene: Pick<Scene, 'id' | 'status'>, archived: boolean): Promise<void> {
  await inTransaction(db, async (trx) => {
    const row = await trx.selectFrom('scenes').select('archived_from').where('id', '=', scene.id).executeTakeFirstOrThrow();
    const to: SceneStatus = archived ? 'archived' : (row.archived_from ?? 'draft');
    await trx
      .updateTable('scenes')
      .set({ status: to, archived_from: archived ? scene.status : null })
      .where('id', '=', scene.id)
      .where('organisation_id', '=', user.organisationId)
      .execute();
    await recordAudit(trx, {
      organisationId: user.organisationId,
      userId: user.id,
      sceneId: scene.id,
      action: archived ? 'scene.archive' : 'scene.unarchive',
      detail: { from: scene.status, to },
    });
  });
}

/**
 * A new draft scene owned by `user`, with the source's latest sketch, location, notes and truck pin. The
 * source, its revisions and its review record are untouched; the copy starts at revision 1.
 */
export async function duplicateScene(db: Db, user: CurrentUser, source: Scene, title: string): Promise<Scene> {
  return inTransaction(db, async (trx) => {
    const copy = await createScene(trx, user, {
      title,
      location: source.location,
      notes: source.notes,
      document: source.document,
      equipmentProfileId: source.equipmentProfileId,
      equipmentProfileVersion: source.equipmentProfileVersion,
    });
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId: copy.id, action: 'scene.duplicate', detail: { from: source.id, title: source.title } });
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, sceneId: source.id, action: 'scene.copied', detail: { to: copy.id } });
    return (await getScene(trx, user, copy.id))!;
  });
}
