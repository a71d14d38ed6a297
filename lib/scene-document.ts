/**
 * A new scene's document. The editor owns the document schema (canvas/document); this stays the one
 * place the server gets a blank document from, so the two cannot drift.
 */
export { emptySceneDocument } from '@/canvas/document/empty';
export type { SceneDocument } from '@/canvas/document/schema';
