import { CURRENT_VERSION, sceneDocumentSchema, type SceneDocument } from './schema';

/** A blank scene: no objects, default swing, soil and limits. */
export function emptySceneDocument(): SceneDocument {
  return sceneDocumentSchema.parse({ version: CURRENT_VERSION, objects: [] });
}
