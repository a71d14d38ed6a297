import type { DB } from '@/db';
import { getScene, type Scene } from '@/db/repositories/scenes';
import { revisionExists } from '@/db/repositories/plan-details';
import { approvedRevision } from '@/db/repositories/submissions';
import { HttpError } from '@/lib/api/errors';
import type { CurrentUser } from '@/lib/auth/current-user';

/**
 * The scene and the revision a plan route works on: `requested` when given (404 when the scene has no
 * such revision), else the approved revision when there is one, else the latest. The scene must be visible
 * to the user exactly as GET /api/scenes/{id} decides (another organisation's scene, or a colleague's draft
 * for an operator, is 404).
 */
export async function planRevision(db: DB, user: CurrentUser, sceneId: number, requested: number | undefined): Promise<{ scene: Scene; revision: number }> {
  const scene = await getScene(db, user, sceneId);
  if (!scene) throw new HttpError(404, 'Scene not found');
  if (requested === undefined) return { scene, revision: (await approvedRevision(db, scene.organisationId, scene.id)) ?? scene.revision };
  if (requested > scene.revision || !(await revisionExists(db, sceneId, requested))) {
    throw new HttpError(404, `query.revision: scene ${sceneId} has no revision ${requested}`, [{ path: 'query.revision', message: 'Unknown revision' }]);
  }
  return { scene, revision: requested };
}
