import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { checkLessonSteps, deleteLesson, getLesson, updateLesson } from '@/db/repositories/lessons';
import { idParams, route } from '@/lib/api/route';
import { HttpError, describeIssues } from '@/lib/api/errors';
import { rolesFor } from '@/lib/auth/permissions';
import { lessonSchema } from '@/lib/validations/lessons';

export const runtime = 'nodejs';

const notFound = () => new HttpError(404, 'Lesson not found');

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const lesson = await getLesson(getDb(), user, params.id);
  if (!lesson) throw notFound();
  return lesson;
});

/** Replaces the lesson's title and steps (the whole list, in the order given). */
export const PUT = route({ roles: rolesFor('writeLessons'), params: idParams, body: lessonSchema }, async ({ user, params, body }) => {
  return inTransaction(getDb(), async (trx) => {
    if (!(await getLesson(trx, user, params.id))) throw notFound();
    const issues = await checkLessonSteps(trx, user.organisationId, body.steps);
    if (issues.length) throw new HttpError(400, `Invalid body: ${describeIssues(issues)}`, issues);
    const lesson = await updateLesson(trx, user, params.id, body);
    if (!lesson) throw notFound();
    return lesson;
  });
});

export const DELETE = route({ roles: rolesFor('writeLessons'), params: idParams }, async ({ user, params }) => {
  if (!(await deleteLesson(getDb(), user, params.id))) throw notFound();
  return { ok: true };
});
