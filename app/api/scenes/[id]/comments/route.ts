import { getDb } from '@/db';
import { HttpError } from '@/lib/api/errors';
import { idParams, route } from '@/lib/api/route';
import { addComment, commentThreads } from '@/lib/server/comments';
import { newCommentSchema } from '@/lib/validations/review';

export const runtime = 'nodejs';

/** The scene's comment threads, for anyone who may read the scene. */
export const GET = route({ params: idParams }, async ({ user, params }) => {
  const threads = await commentThreads(getDb(), user, params.id);
  if (!threads) throw new HttpError(404, 'Scene not found');
  return { items: threads };
});

/** A comment (pinned to a point or an object, or general) or a reply to a thread. */
export const POST = route({ params: idParams, body: newCommentSchema }, async ({ user, params, body }) => {
  const out = await addComment(getDb(), user, params.id, body);
  return Response.json(out.body, { status: out.status });
});
