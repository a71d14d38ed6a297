import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { insertSceneUpload, type SceneUpload } from '@/db/repositories/scene-uploads';
import { recordAudit } from '@/db/repositories/audit';
import { deleteObject, putObject } from '@/lib/storage';
import type { SniffedImage } from '@/lib/image-sniff';

export interface StoreUploadInput {
  organisationId: number;
  sceneId: number;
  uploaderId: number;
  bytes: Uint8Array;
  image: SniffedImage;
}

/**
 * Writes the file, then its row and audit entry in one transaction. A file cannot take part in a SQL
 * transaction, so if the row fails the file is removed again: no orphan file, no row without a file.
 */
export async function storeSceneUpload(db: Kysely<Database>, input: StoreUploadInput): Promise<SceneUpload> {
  const key = await putObject(input.bytes);
  try {
    return await db.transaction().execute(async (trx) => {
      const upload = await insertSceneUpload(trx, {
        organisation_id: input.organisationId,
        scene_id: input.sceneId,
        storage_key: key,
        mime: input.image.mime,
        bytes: input.bytes.byteLength,
        width: input.image.width,
        height: input.image.height,
        uploader_id: input.uploaderId,
      });
      await recordAudit(trx, {
        organisationId: input.organisationId,
        userId: input.uploaderId,
        sceneId: input.sceneId,
        action: 'scene.background.upload',
        detail: { uploadId: upload.id, mime: upload.mime, bytes: upload.bytes },
      });
      return upload;
    });
  } catch (err) {
    await deleteObject(key).catch(() => undefined);
    throw err;
  }
}
