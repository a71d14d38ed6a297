import type { DB } from '@/db';
import type { CurrentUser } from '@/lib/auth/current-user';
import type { TrainingScene } from '@/components/lessons/lesson-form';

/** The organisation's training set, for the lesson builder's scene picker. */
export async function trainingScenes(db: DB, user: CurrentUser): Promise<TrainingScene[]> {
  const rows = await db
    .selectFrom('scenes')
    .select(['id', 'title', 'revision'])
    .where('organisation_id', '=', user.organisationId)
    .where('deleted_at', 'is', null)
    .where('in_training_set', '=', 1)
    .orderBy('title')
    .execute();
  return rows.map((r) => ({ id: r.id, title: r.title, latest: r.revision }));
}
