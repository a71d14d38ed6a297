import type { DB } from '@/db';
import { findProfileVersion } from '@/db/repositories/equipment';
import { planDetailsAt } from '@/db/repositories/plan-details';
import { approvedRevision, listSubmissions } from '@/db/repositories/submissions';
import { HttpError } from '@/lib/api/errors';
import type { CurrentUser } from '@/lib/auth/current-user';
import { analyseSavedScene } from '@/lib/server/scene-analysis';
import { parseSceneDocument } from '@/lib/scene/parse';
import { buildPlanData, type PlanData, type PlanInputs, type SignOffDecision } from '@/components/plan-pdf/plan-data';
import { planRevision } from './plan-revision';

/**
 * Everything the plan document shows for one saved revision, read and computed on the server: the stored
 * sketch, the truck profile version it pins, the server's analysis of that revision, the plan details saved
 * with it, the rigging items' inspection dates, and the sign-off.
 */
export async function loadPlanData(db: DB, user: CurrentUser, sceneId: number, requested: number | undefined): Promise<PlanData> {
  const { scene, revision } = await planRevision(db, user, sceneId, requested);
  const row = await db
    .selectFrom('scene_revisions')
    .innerJoin('users', 'users.id', 'scene_revisions.author_id')
    .select(['scene_revisions.document', 'scene_revisions.created_at', 'users.name'])
    .where('scene_revisions.scene_id', '=', scene.id)
    .where('scene_revisions.revision', '=', revision)
    .executeTakeFirstOrThrow();
  const parsed = parseSceneDocument(row.document);
  if (!parsed.ok) throw new HttpError(422, `The saved sketch of revision ${revision} does not match the editor's format`);
  const doc = parsed.document;

  const found = await analyseSavedScene(db, user, scene.id, revision);
  if (found.kind !== 'done') throw new HttpError(404, 'Scene not found');
  const a = found.analysis;
  const analysis: PlanInputs['analysis'] = a.ok ? { ok: true, result: a.result, names: a.names } : { ok: false, message: a.message };

  const pin = a.meta.truckProfile;
  const version = pin ? await findProfileVersion(db, scene.organisationId, pin.id, pin.version) : undefined;
  const profile = version ? { id: version.profileId, version: version.version, name: version.name, unitNumber: version.unitNumber, spec: version.spec } : null;

  const picks = doc.objects.flatMap((o) => (o.kind === 'load' ? o.rigging : []));
  const items = picks.length
    ? await db
        .selectFrom('rigging_items')
        .select(['id', 'tag', 'last_inspection', 'next_inspection_due'])
        .where('organisation_id', '=', scene.organisationId)
        .where((eb) => eb.or([eb('id', 'in', [0, ...picks.flatMap((p) => (p.itemId === null ? [] : [p.itemId]))]), eb('tag', 'in', picks.map((p) => p.tag))]))
        .execute()
    : [];
  const inspections = new Map<number | string, { lastInspection: string | null; nextDue: string | null }>();
  for (const i of items) {
    const v = { lastInspection: i.last_inspection, nextDue: i.next_inspection_due };
    inspections.set(i.id, v);
    inspections.set(i.tag, v);
  }

  const stored = await planDetailsAt(db, scene.id, revision);
  const [approved, submissions] = await Promise.all([approvedRevision(db, scene.organisationId, scene.id), listSubmissions(db, scene.organisationId, scene.id)]);
  // The review decisions on this revision, oldest first: who approved (or returned) it, when, and on what terms.
  const signOff: SignOffDecision[] = submissions
    .filter((x) => x.revision === revision && (x.state === 'approved' || x.state === 'returned') && x.decidedByName && x.decidedAt)
    .reverse()
    .map((x) => ({ action: x.state === 'approved' ? 'Approved' : 'Returned for changes', by: x.decidedByName!, role: x.decidedByRole ?? '', at: x.decidedAt!, conditions: x.conditions ?? '', reason: x.reason ?? '' }));
  return buildPlanData({
    meta: {
      sceneId: scene.id,
      organisation: user.organisationName,
      title: scene.title,
      revision,
      latestRevision: scene.revision,
      status: scene.status,
      approved: approved === revision,
      savedBy: row.name,
      savedAt: row.created_at,
      generatedAt: new Date().toISOString(),
      units: user.units,
    },
    doc,
    profile,
    analysis,
    details: stored.details,
    inspections,
    signOff,
  });
}
