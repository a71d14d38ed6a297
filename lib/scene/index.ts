export * from './primitives';
export * from './objects';
export * from './schema';
export { migrations, migrateDocument, DocumentVersionError } from './migrations';
export { emptySceneDocument } from './empty';
export { parseSceneDocument, storedSceneDocumentSchema } from './parse';
