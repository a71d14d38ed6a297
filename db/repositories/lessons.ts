import type { Kysely } from 'kysely';
import type { Database } from '../schema';
import type { CurrentUser } from '@/lib/domain';
import type { FieldIssue } from '@/lib/api/errors';
import type { LessonInput } from '@/lib/validations/lessons';
import { inTransaction } from '../transaction';
import { recordAudit } from './audit';
import { getScene } from './scenes';

type Db = Kysely<Database>;

export interface LessonStep {
  position: number;
  sceneId: number;
  revision: number;
  /** The scene's title when the reader may open the scene; null otherwise (nothing leaks through a lesson). */
  sceneTitle: string | null;
  notes: string;
  question: string | null;
  answer: string | null;
}

export interface LessonSummary {
  id: number;
  title: string;
  stepCount: number;
  authorName: string;
  updatedAt: string;
}

export interface Lesson extends Omit<LessonSummary, 'stepCount'> {
  authorId: number;
  createdAt: string;
  steps: LessonStep[];
}

export async function listLessons(db: Db, organisationId: number): Promise<LessonSummary[]> {
  const rows = await db
    .selectFrom('lessons')
    .innerJoin('users', 'users.id', 'lessons.author_id')
    .leftJoin('lesson_steps', 'lesson_steps.lesson_id', 'lessons.id')
    .where('lessons.organisation_id', '=', organisationId)
    .groupBy(['lessons.id', 'lessons.title', 'lessons.updated_at', 'users.name'])
    .select((eb) => ['lessons.id', 'lessons.title', 'lessons.updated_at', 'users.name as author_name', eb.fn.count<number>('lesson_steps.id').as('steps')])
    .orderBy('lessons.updated_at', 'desc')
    .orderBy('lessons.id', 'desc')
    .execute();
  return rows.map((r) => ({ id: r.id, title: r.title, stepCount: Number(r.steps), authorName: r.author_name, updatedAt: r.updated_at }));
}

export async function getLesson(db: Db, user: CurrentUser, id: number): Promise<Lesson | undefined> {
  const row = await db
    .selectFrom('lessons')
    .innerJoin('users', 'users.id', 'lessons.author_id')
    .selectAll('lessons')
    .select('users.name as author_name')
    .where('lessons.id', '=', id)
    .where('lessons.organisation_id', '=', user.organisationId)
    .executeTakeFirst();
  if (!row) return undefined;
  const steps = await db.selectFrom('lesson_steps').selectAll().where('lesson_id', '=', id).orderBy('position').execute();
  const titles = new Map<number, string | null>();
  for (const s of steps) {
    if (!titles.has(s.scene_id)) titles.set(s.scene_id, (await getScene(db, user, s.scene_id))?.title ?? null);
  }
  return {
    id: row.id,
    title: row.title,
    authorId: row.author_id,
    authorName: row.author_name,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    steps: steps.map((s) => ({
      position: s.position,
      sceneId: s.scene_id,
      revision: s.revision,
      sceneTitle: titles.get(s.scene_id) ?? null,
      notes: s.notes,
      question: s.question,
      answer: s.answer,
    })),
  };
}

/**
 * Field issues for steps that do not name a training-set scene of the user's organisation at a saved
 * revision. Another organisation's scene reads as unknown, as it does everywhere else.
 */
export async function checkLessonSteps(db: Db, organisationId: number, steps: LessonInput['steps']): Promise<FieldIssue[]> {
  const issues: FieldIssue[] = [];
  for (const [i, step] of steps.entries()) {
    const scene = await db
      .selectFrom('scenes')
      .select(['id', 'in_training_set'])
      .where('id', '=', step.sceneId)
      .where('organisation_id', '=', organisationId)
      .where('deleted_at', 'is', null)
      .executeTakeFirst();
    if (!scene) {
      issues.push({ path: `steps.${i}.sceneId`, message: `No scene ${step.sceneId} in your organisation` });
      continue;
    }
    if (scene.in_training_set !== 1) {
      issues.push({ path: `steps.${i}.sceneId`, message: `Scene ${step.sceneId} is not in the training set` });
      continue;
    }
    const rev = await db.selectFrom('scene_revisions').select('id').where('scene_id', '=', step.sceneId).where('revision', '=', step.revision).executeTakeFirst();
    if (!rev) issues.push({ path: `steps.${i}.revision`, message: `Scene ${step.sceneId} has no saved revision ${step.revision}` });
  }
  return issues;
}

async function writeSteps(trx: Db, lessonId: number, steps: LessonInput['steps']) {
  await trx.deleteFrom('lesson_steps').where('lesson_id', '=', lessonId).execute();
  await trx
    .insertInto('lesson_steps')
    .values(
      steps.map((s, position) => ({
        lesson_id: lessonId,
        position,
        scene_id: s.sceneId,
        revision: s.revision,
        notes: s.notes,
        question: s.question || null,
        answer: s.answer || null,
      })),
    )
    .execute();
}

export async function createLesson(db: Db, user: CurrentUser, input: LessonInput): Promise<Lesson> {
  return inTransaction(db, async (trx) => {
    const now = new Date().toISOString();
    const row = await trx
      .insertInto('lessons')
      .values({ organisation_id: user.organisationId, author_id: user.id, title: input.title, created_at: now, updated_at: now })
      .returning('id')
      .executeTakeFirstOrThrow();
    await writeSteps(trx, row.id, input.steps);
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'lesson.create', detail: { lessonId: row.id, title: input.title } });
    return (await getLesson(trx, user, row.id))!;
  });
}

/** Replaces the title and every step. Undefined when the lesson is not the user's organisation's. */
export async function updateLesson(db: Db, user: CurrentUser, id: number, input: LessonInput): Promise<Lesson | undefined> {
  return inTransaction(db, async (trx) => {
    const res = await trx
      .updateTable('lessons')
      .set({ title: input.title, updated_at: new Date().toISOString() })
      .where('id', '=', id)
      .where('organisation_id', '=', user.organisationId)
      .executeTakeFirst();
    if (Number(res.numUpdatedRows) === 0) return undefined;
    await writeSteps(trx, id, input.steps);
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'lesson.update', detail: { lessonId: id, title: input.title } });
    return getLesson(trx, user, id);
  });
}

export async function deleteLesson(db: Db, user: CurrentUser, id: number): Promise<boolean> {
  return inTransaction(db, async (trx) => {
    await trx.deleteFrom('lesson_steps').where('lesson_id', 'in', trx.selectFrom('lessons').select('id').where('id', '=', id).where('organisation_id', '=', user.organisationId)).execute();
    const res = await trx.deleteFrom('lessons').where('id', '=', id).where('organisation_id', '=', user.organisationId).executeTakeFirst();
    if (Number(res.numDeletedRows) === 0) return false;
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'lesson.delete', detail: { lessonId: id } });
    return true;
  });
}
