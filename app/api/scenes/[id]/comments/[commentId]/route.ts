import { z } from 'zod';
import { getDb } from '@/db';
import { route } from '@/lib/api/route';
import { pathId } from '@/lib/validations/path-id';
import { resolveComment } from '@/lib/server/comments';
import { commentPatchSchema } from '@/lib/validations/review';

export const runtime = 'nodejs';

const params = z.object({ id: pathId('id'), commentId: pathId('commentId') });

/** Resolve or reopen a comment. */
export const PATCH = route({ params, body: commentPatchSchema }, async ({ user, params, body }) => {
  const out = await resolveComment(getDb(), user, params.id, params.commentId, body.resolved);
  return Response.json(out.body, { status: out.status });
});
