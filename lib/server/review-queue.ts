import type { Kysely } from 'kysely';
import type { Database } from '@/db/schema';
import { countReviewQueue, listReviewQueue } from '@/db/repositories/submissions';
import { planDetailsAt } from '@/db/repositories/plan-details';
import { unreadCount } from '@/db/repositories/notifications';
import type { CurrentUser } from '@/lib/domain';
import { today } from '@/lib/dates';
import type { PlanFigures } from '@/lib/review/figures';
import { isReviewer } from '@/lib/review/permissions';
import { minutesBetween, queueFlags, type QueueItem } from '@/lib/review/queue';

type Db = Kysely<Database>;

/**
 * The review queue: the organisation's submitted plans, oldest first, with the headline figures the server
 * stored at submission and the flags (lib/review/queue) a supervisor should see before opening one.
 */
export async function reviewQueue(db: Db, user: CurrentUser): Promise<QueueItem[]> {
  const rows = await listReviewQueue(db, user.organisationId);
  if (!rows.length) return [];
  const [profiles, overdue] = await Promise.all([
    db.selectFrom('equipment_profiles').select(['id', 'version', 'name', 'unit_number']).where('organisation_id', '=', user.organisationId).execute(),
    db
      .selectFrom('rigging_items')
      .select(['id', 'tag'])
      .where('organisation_id', '=', user.organisationId)
      .where('next_inspection_due', 'is not', null)
      .where('next_inspection_due', '<', today())
      .execute(),
  ]);
  const ctx = {
    profileVersions: new Map(profiles.map((p) => [p.id, p.version])),
    overdueItems: { ids: new Set(overdue.map((r) => r.id)), tags: new Set(overdue.map((r) => r.tag)) },
  };
  const now = Date.now();
  return Promise.all(
    rows.map(async (r) => {
      const figures = r.figures as unknown as PlanFigures;
      const details = await planDetailsAt(db, r.sceneId, r.revision);
      const truck = ((r.document as { objects?: { kind?: string; profileId?: number }[] }).objects ?? []).find((o) => o.kind === 'truck');
      const profile = truck ? profiles.find((p) => p.id === truck.profileId) : undefined;
      return {
        sceneId: r.sceneId,
        title: r.title,
        revision: r.revision,
        ownerName: r.ownerName,
        submittedAt: r.submittedAt,
        waitingMinutes: minutesBetween(r.submittedAt, now),
        truck: profile ? `${profile.unit_number ? `${profile.unit_number} ` : ''}${profile.name}` : null,
        figures,
        flags: queueFlags(r.document, figures, { ...ctx, weightSource: details.details.load.weightSource }),
      };
    }),
  );
}

/** The counts beside the navigation: plans awaiting review (reviewers only, else null) and unread notifications. */
export async function navCounts(db: Db, user: CurrentUser): Promise<{ review: number | null; unread: number }> {
  const [review, unread] = await Promise.all([isReviewer(user.role) ? countReviewQueue(db, user.organisationId) : Promise.resolve(null), unreadCount(db, user.id)]);
  return { review, unread };
}
