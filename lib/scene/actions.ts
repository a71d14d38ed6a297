import type { SceneStatus } from '@/lib/domain';
import { may, mayArchiveScene, mayDeleteScene, type Who } from '@/lib/auth/permissions';

export interface ActionScene {
  id: number;
  title: string;
  status: SceneStatus;
  ownerId: number;
  inTrainingSet: boolean;
}

export type SceneAction = 'duplicate' | 'archive' | 'unarchive' | 'delete' | 'training';

/** The everyday actions this user has on this scene, in the order the list and details page offer them. */
export function sceneActionsFor(user: Who, scene: ActionScene): SceneAction[] {
  const out: SceneAction[] = [];
  if (may(user, 'createScene')) out.push('duplicate');
  if (may(user, 'markTraining')) out.push('training');
  // A plan awaiting review is withdrawn before it is archived (the archive route says so too).
  if (mayArchiveScene(user, scene) && scene.status !== 'submitted') out.push(scene.status === 'archived' ? 'unarchive' : 'archive');
  if (mayDeleteScene(user, scene)) out.push('delete');
  return out;
}
