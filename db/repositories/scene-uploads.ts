import type { Kysely } from 'kysely';
import type { Database, NewSceneUpload, SceneUploadRow } from '../schema';

type Db = Kysely<Database>;

export interface SceneUpload {
  id: number;
  sceneId: number;
  storageKey: string;
  mime: SceneUploadRow['mime'];
  bytes: number;
  width: number | null;
  height: number | null;
  uploaderId: number;
  createdAt: string;
}

function toUpload(row: SceneUploadRow): SceneUpload {
  return {
    id: row.id,
    sceneId: row.scene_id,
    storageKey: row.storage_key,
    mime: row.mime,
    bytes: row.bytes,
    width: row.width,
    height: row.height,
    uploaderId: row.uploader_id,
    createdAt: row.created_at,
  };
}

export async function insertSceneUpload(db: Db, row: Omit<NewSceneUpload, 'created_at'>): Promise<SceneUpload> {
  const inserted = await db
    .insertInto('scene_uploads')
    .values({ ...row, created_at: new Date().toISOString() })
    .returningAll()
    .executeTakeFirstOrThrow();
  return toUpload(inserted);
}

/** One upload, only if it belongs to this scene in this organisation. */
export async function findSceneUpload(db: Db, organisationId: number, sceneId: number, uploadId: number): Promise<SceneUpload | undefined> {
  const row = await db
    .selectFrom('scene_uploads')
    .selectAll()
    .where('id', '=', uploadId)
    .where('scene_id', '=', sceneId)
    .where('organisation_id', '=', organisationId)
    .executeTakeFirst();
  return row ? toUpload(row) : undefined;
}

export async function countSceneUploads(db: Db, sceneId: number): Promise<number> {
  const r = await db.selectFrom('scene_uploads').select((eb) => eb.fn.countAll<number>().as('n')).where('scene_id', '=', sceneId).executeTakeFirstOrThrow();
  return Number(r.n);
}
