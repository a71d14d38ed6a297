import { z } from 'zod';
import { migrateDocument } from './migrations';
import { sceneDocumentSchema, type SceneDocument } from './schema';

/** Migrates then validates; the one way a stored or imported document enters the editor. */
export function parseSceneDocument(raw: unknown): { ok: true; document: SceneDocument } | { ok: false; issues: { path: string; message: string }[] } {
  let migrated: unknown;
  try {
    migrated = migrateDocument(raw);
  } catch (e) {
    return { ok: false, issues: [{ path: 'version', message: (e as Error).message }] };
  }
  const parsed = sceneDocumentSchema.safeParse(migrated);
  if (parsed.success) return { ok: true, document: parsed.data };
  return { ok: false, issues: parsed.error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message })) };
}

/** The schema the server uses for request bodies: older versions are migrated first. */
export const storedSceneDocumentSchema = z.preprocess((raw) => {
  try {
    return migrateDocument(raw);
  } catch {
    return raw;
  }
}, sceneDocumentSchema);
