import type { Kysely } from 'kysely';
import type { Database } from '../schema';
import { hashPassword } from '@/lib/auth/password';
import { DEMO_ORGS, DEMO_PASSWORD, DEMO_USERS } from './demo-users';
import { DEMO_TRUCKS } from './demo-trucks';
import { seedDemoRigging } from './demo-rigging';
import { createEquipmentProfile } from '../repositories/equipment';
import { fullSnapshot } from '../repositories/revision-storage';
import { DEMO_SCENES, withTruckProfile } from './demo-scenes';
import { REVIEW_SCENES } from './demo-review-scenes';
import { seedDemoReview } from './demo-review';
import { seedDemoLessons } from './demo-lessons';
import { DEMO_PLAN_DETAILS } from './demo-plan-details';
import { planDetailsSchema } from '@/lib/plan-details/schema';

/** Inserts the invented demo scenario into an empty database, in one transaction. Returns false if data exists. */
export async function seedDemo(db: Kysely<Database>): Promise<boolean> {
  const existing = await db.selectFrom('organisations').select('id').limit(1).executeTakeFirst();
  if (existing) return false;
  const hash = await hashPassword(DEMO_PASSWORD);
  const now = new Date().toISOString();
  await db.transaction().execute(async (trx) => {
    const orgIds = new Map<string, number>();
    for (const o of DEMO_ORGS) {
      const row = await trx.insertInto('organisations').values({ name: o.name, slug: o.slug, created_at: now }).returning('id').executeTakeFirstOrThrow();
      orgIds.set(o.slug, row.id);
    }
    const userIds = new Map<string, number>();
    for (const u of DEMO_USERS) {
      const row = await trx
        .insertInto('users')
        .values({ organisation_id: orgIds.get(u.org)!, email: u.email, name: u.name, role: u.role, password_hash: hash, created_at: now })
        .returning('id')
        .executeTakeFirstOrThrow();
      userIds.set(u.email, row.id);
    }
    const truckIds = new Map<string, { id: number; version: number }>();
    for (const t of DEMO_TRUCKS) {
      const p = await createEquipmentProfile(trx, orgIds.get(t.org)!, { kind: 'truck', name: t.name, unitNumber: t.unitNumber, spec: t.spec });
      truckIds.set(t.unitNumber, { id: p.id, version: p.version });
    }
    await seedDemoRigging(trx, orgIds, userIds);
    const sceneIds = new Map<string, number>();
    for (const s of [...DEMO_SCENES, ...REVIEW_SCENES]) {
      const owner = userIds.get(s.owner)!;
      const truck = s.truck ? truckIds.get(s.truck) : undefined;
      const doc = JSON.stringify(withTruckProfile(s.document, truck));
      const history = (s.history ?? []).map((d) => JSON.stringify(withTruckProfile(d, truck)));
      const revision = history.length + 1;
      const row = await trx
        .insertInto('scenes')
        .values({
          organisation_id: orgIds.get(s.org)!,
          owner_id: owner,
          title: s.title,
          status: s.status,
          document: doc,
          revision,
          equipment_profile_id: truck?.id ?? null,
          equipment_profile_version: truck?.version ?? null,
          in_training_set: s.inTrainingSet ? 1 : 0,
          created_at: now,
          updated_at: now,
        })
        .returning('id')
        .executeTakeFirstOrThrow();
      sceneIds.set(s.title, row.id);
      // Earlier saves a day apart, so the replay's timeline has a story to tell.
      const at = (k: number) => new Date(Date.parse(now) - (revision - k) * 86_400_000).toISOString();
      for (const [i, d] of [...history, doc].entries()) {
        await trx.insertInto('scene_revisions').values({ scene_id: row.id, revision: i + 1, document: fullSnapshot(trx, d), author_id: owner, created_at: at(i + 1) }).execute();
      }
      const details = DEMO_PLAN_DETAILS[s.title];
      if (details) {
        const json = JSON.stringify(planDetailsSchema.parse(details));
        await trx.insertInto('scene_plan_details').values({ organisation_id: orgIds.get(s.org)!, scene_id: row.id, revision, details: json, author_id: owner, created_at: now }).execute();
      }
    }
    await seedDemoReview(trx);
    await seedDemoLessons(trx, orgIds, userIds, sceneIds);
  });
  return true;
}
