import { z } from 'zod';
import { getDb } from '@/db';
import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { pathId } from '@/lib/validations/path-id';
import { revisionDetail } from '@/lib/server/scene-revisions';

export const runtime = 'nodejs';

const params = z.object({ id: pathId('id'), revision: pathId('revision') });

/** One saved revision: its document as stored and the engine's result for it, computed on the server. */
export const GET = route({ params }, async ({ user, params }) => {
  const found = await revisionDetail(getDb(), user, params.id, params.revision);
  if (found.kind === 'missing') throw new HttpError(404, 'Scene not found');
  if (found.kind === 'no-revision') {
    throw new HttpError(404, `params.revision: this scene has no revision ${params.revision}; the latest is ${found.latest}`, [{ path: 'params.revision', message: 'No such revision' }]);
  }
  return found.body;
});
