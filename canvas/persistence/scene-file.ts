import { z } from 'zod';
import { sceneTitle } from '@/lib/validations/scenes';

/**
 * Arcline's own scene file: an envelope around one scene document. Documented in docs/scene-format.md.
 * The document inside is checked by the editor's schema after its up-migrations, so an older file still imports.
 */
export const SCENE_FILE_FORMAT = 'arcline-scene';
export const SCENE_FILE_VERSION = 1;
/** Same bound as the API's JSON bodies: a bigger file could not be posted anyway. */
export const MAX_SCENE_FILE_CHARS = 2 * 1024 * 1024;

export interface SceneFile<Doc = unknown> {
  format: typeof SCENE_FILE_FORMAT;
  formatVersion: typeof SCENE_FILE_VERSION;
  /** ISO-8601 time the file was written. */
  exportedAt: string;
  title: string;
  document: Doc;
}

export interface FieldIssue {
  path: string;
  message: string;
}

export type DocumentParser<Doc> = (raw: unknown) => { ok: true; document: Doc } | { ok: false; issues: FieldIssue[] };

export type ImportResult<Doc> = { ok: true; title: string; exportedAt: string; document: Doc } | { ok: false; issues: FieldIssue[] };

const envelopeSchema = z.object({
  format: z.literal(SCENE_FILE_FORMAT, { error: `Expected "${SCENE_FILE_FORMAT}": this is not an Arcline scene file` }),
  formatVersion: z
    .number({ error: 'Expected a number' })
    .int('Expected a whole number')
    .refine((v) => v <= SCENE_FILE_VERSION, `This file was written by a newer Arcline (format version above ${SCENE_FILE_VERSION})`)
    .refine((v) => v >= 1, 'Unknown format version'),
  exportedAt: z.iso.datetime({ offset: true, error: 'Expected an ISO date and time, e.g. 2026-12-01T21:30:00Z' }),
  title: sceneTitle,
  document: z.record(z.string(), z.unknown(), { error: 'Expected the scene document as a JSON object' }),
});

export function buildSceneFile<Doc>(title: string, document: Doc, exportedAt: Date = new Date()): SceneFile<Doc> {
  return { format: SCENE_FILE_FORMAT, formatVersion: SCENE_FILE_VERSION, exportedAt: exportedAt.toISOString(), title, document };
}

export function serializeSceneFile(file: SceneFile): string {
  return `${JSON.stringify(file, null, 2)}\n`;
}

/** "Coil transfer, Route 9" → "coil-transfer-route-9.arcline.json" */
export function sceneFileName(title: string): string {
  const slug = title
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return `${slug || 'scene'}.arcline.json`;
}

/** Reads a scene file's text; every problem comes back with the field it is in. */
export function parseSceneFile<Doc>(text: string, parseDocument: DocumentParser<Doc>): ImportResult<Doc> {
  if (text.length > MAX_SCENE_FILE_CHARS) return { ok: false, issues: [{ path: 'file', message: 'The file is larger than 2 MB' }] };
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false, issues: [{ path: 'file', message: 'The file is not valid JSON' }] };
  }
  if (!raw || typeof raw !== 'object' || Array.isArray(raw)) return { ok: false, issues: [{ path: 'file', message: 'Expected a JSON object' }] };
  const env = envelopeSchema.safeParse(raw);
  if (!env.success) {
    const issues = env.error.issues.map((i) => ({ path: i.path.map(String).join('.') || 'file', message: i.message }));
    // A wrong format tag makes the other fields meaningless; report it alone.
    const tag = issues.find((i) => i.path === 'format');
    return { ok: false, issues: tag ? [tag] : issues };
  }
  const doc = parseDocument(env.data.document);
  if (!doc.ok) return { ok: false, issues: doc.issues.map((i) => ({ path: i.path ? `document.${i.path}` : 'document', message: i.message })) };
  return { ok: true, title: env.data.title, exportedAt: env.data.exportedAt, document: doc.document };
}
