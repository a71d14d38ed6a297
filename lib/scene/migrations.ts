import { CURRENT_VERSION } from './schema';

/**
 * Up-migrations, one per version step: migrations[n] turns a version-n document into version n+1.
 * Saved scenes outlive the code, so a migration is never edited once it has shipped; add a new one.
 */
type Raw = Record<string, unknown>;

export const migrations: Record<number, (doc: Raw) => Raw> = {
  // v1 (the foundation's placeholder) had only { version, objects: [] } with no settled object shape;
  // v2 adds the swing plan, soil, limits and background, and keeps objects it can read.
  1: (doc) => ({
    ...doc,
    version: 2,
    objects: Array.isArray(doc.objects) ? doc.objects : [],
    swing: doc.swing ?? { from: 0, to: 90, direction: 'ccw' },
    soil: doc.soil ?? { preset: 'custom', allowable: 144 },
    limits: doc.limits ?? {},
    background: doc.background ?? null,
  }),
  // v3 adds the usable area the placement advisor keeps the truck inside (none marked yet).
  2: (doc) => ({ ...doc, version: 3, usableArea: doc.usableArea ?? null }),
};

export class DocumentVersionError extends Error {}

/** Brings any known older document up to CURRENT_VERSION (schema validation is the caller's next step). */
export function migrateDocument(input: unknown): unknown {
  if (!input || typeof input !== 'object' || Array.isArray(input)) return input;
  let doc = input as Raw;
  let v = typeof doc.version === 'number' ? doc.version : 1;
  if (v > CURRENT_VERSION) throw new DocumentVersionError(`This scene was saved by a newer Arcline (document version ${v}); reload the page to update.`);
  while (v < CURRENT_VERSION) {
    const step = migrations[v];
    if (!step) throw new DocumentVersionError(`No migration from document version ${v}`);
    doc = step(doc);
    v = doc.version as number;
  }
  return doc;
}
