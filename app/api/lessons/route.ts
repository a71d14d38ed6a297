import { getDb } from '@/db';
import { inTransaction } from '@/db/transaction';
import { checkLessonSteps, createLesson, listLessons } from '@/db/repositories/lessons';
import { route } from '@/lib/api/route';
import { HttpError, describeIssues } from '@/lib/api/errors';
import { rolesFor } from '@/lib/auth/permissions';
import { lessonSchema } from '@/lib/validations/lessons';

export const runtime = 'nodejs';

/** The organisation's lessons, newest change first; every role reads them. */
export const GET = route({}, async ({ user }) => ({ items: await listLessons(getDb(), user.organisationId) }));

export const POST = route({ roles: rolesFor('writeLessons'), body: lessonSchema }, async ({ user, body }) => {
  const lesson = await inTransaction(getDb(), async (trx) => {
    const issues = await checkLessonSteps(trx, user.organisationId, body.steps);
    if (issues.length) throw new HttpError(400, `Invalid body: ${describeIssues(issues)}`, issues);
    return createLesson(trx, user, body);
  });
  return Response.json(lesson, { status: 201 });
});
