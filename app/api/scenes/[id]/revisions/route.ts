import { getDb } from '@/db';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { listRevisionSummaries } from '@/lib/server/scene-revisions';

export const runtime = 'nodejs';

/** A scene's saved revisions, newest first, each with headline figures the server computed. */
export const GET = route({ params: idParams }, async ({ user, params }) => {
  const list = await listRevisionSummaries(getDb(), user, params.id);
  if (!list) throw new HttpError(404, 'Scene not found');
  return list;
});
