import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { getScene } from '@/db/repositories/scenes';
import { findProfileVersion } from '@/db/repositories/equipment';
import type { CurrentUser } from '@/lib/domain';
import { analyzeLift, isLiftError, type LiftInputIn, type LiftResult } from '@/lib/lift';
import { ENGINE_VERSION } from '@/lib/lift/version';
import { parseSceneDocument } from '@/lib/scene/parse';
import { sceneToLiftInput } from '@/lib/scene/to-lift-input';
import { truckModelFromProfile } from '@/lib/scene/truck/from-spec';

/**
 * The engine's result for a saved revision of a scene, computed on the server exactly as the editor does:
 * the stored document, the truck profile version its truck is drawn from, the same sceneToLiftInput, the
 * same engine. The review desk, the plan document and the replay all read figures from here.
 */
export interface SavedAnalysisMeta {
  sceneId: number;
  revision: number;
  engineVersion: string;
  /** The truck profile version the document pins (null when the sketch has no truck). */
  truckProfile: { id: number; version: number } | null;
}

export type SavedAnalysis =
  | { ok: true; meta: SavedAnalysisMeta; result: LiftResult; names: Record<string, string>; input: LiftInputIn }
  /** Why there is nothing to compute: an unfinished sketch, a truck setup fault, or an engine refusal. */
  | { ok: false; meta: SavedAnalysisMeta; code: string; message: string; field?: string };

export type SavedAnalysisLookup = { kind: 'missing' } | { kind: 'no-revision'; latest: number } | { kind: 'done'; analysis: SavedAnalysis; cached: boolean };

/**
 * Results by scene and revision. A revision's document never changes and profile versions are kept as
 * written, so an entry stays right for the life of the process; the revision row's id guards against a
 * database that was reset underneath (tests). Bounded: the oldest entry goes first.
 */
const CACHE_LIMIT = 200;
const cache = new Map<string, SavedAnalysis>();

function remember(key: string, value: SavedAnalysis) {
  cache.delete(key);
  cache.set(key, value);
  while (cache.size > CACHE_LIMIT) cache.delete(cache.keys().next().value!);
}

/** Computes a stored document without any cache (used by the cache on a miss, and by submit). */
export async function computeDocument(
  db: Kysely<Database>,
  organisationId: number,
  meta: Omit<SavedAnalysisMeta, 'engineVersion' | 'truckProfile'>,
  raw: unknown,
): Promise<SavedAnalysis> {
  const parsed = parseSceneDocument(raw);
  const base = { ...meta, engineVersion: ENGINE_VERSION, truckProfile: null };
  if (!parsed.ok) return { ok: false, meta: base, code: 'invalid-document', message: `The saved sketch does not match the editor's format (${parsed.issues[0]?.path || 'document'}: ${parsed.issues[0]?.message ?? 'invalid'}).` };
  const doc = parsed.document;
  const truck = doc.objects.find((o) => o.kind === 'truck');
  const pin = truck && truck.kind === 'truck' ? { id: truck.profileId, version: truck.profileVersion } : null;
  const withPin: SavedAnalysisMeta = { ...base, truckProfile: pin };
  // Exactly the version the plan was drawn with, as the editor resolves it: another version's figures would change the plan.
  const version = pin ? await findProfileVersion(db, organisationId, pin.id, pin.version) : undefined;
  const model = version ? truckModelFromProfile({ id: version.profileId, version: version.version, name: version.name, unitNumber: version.unitNumber, spec: version.spec }) : null;
  const lift = sceneToLiftInput(doc, model);
  if (!lift.ok) return { ok: false, meta: withPin, code: lift.problem.kind, message: lift.problem.message, ...(lift.problem.field ? { field: lift.problem.field } : {}) };
  try {
    return { ok: true, meta: withPin, result: analyzeLift(lift.input), names: lift.names, input: lift.input };
  } catch (e) {
    if (isLiftError(e)) return { ok: false, meta: withPin, code: e.code, message: e.message };
    throw e;
  }
}

/**
 * A revision of a scene the user may read (latest when `revision` is omitted), computed or from cache.
 * Another organisation's or an unreadable scene is `missing`, as an unknown one is.
 */
export async function analyseSavedScene(db: Kysely<Database>, user: CurrentUser, sceneId: number, revision?: number): Promise<SavedAnalysisLookup> {
  const scene = await getScene(db, user, sceneId);
  if (!scene) return { kind: 'missing' };
  const want = revision ?? scene.revision;
  if (want > scene.revision) return { kind: 'no-revision', latest: scene.revision };
  const row = await db
    .selectFrom('scene_revisions')
    .select(['id', 'document'])
    .where('scene_id', '=', sceneId)
    .where('revision', '=', want)
    .executeTakeFirst();
  if (!row) return { kind: 'no-revision', latest: scene.revision };
  const key = `${sceneId}:${want}:${row.id}`;
  const hit = cache.get(key);
  if (hit) return { kind: 'done', analysis: hit, cached: true };
  const analysis = await computeDocument(db, scene.organisationId, { sceneId, revision: want }, row.document);
  remember(key, analysis);
  return { kind: 'done', analysis, cached: false };
}
