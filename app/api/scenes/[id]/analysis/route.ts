import { z } from 'zod';
import { getDb } from '@/db';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { pathId } from '@/lib/validations/path-id';
import { analyseSavedScene } from '@/lib/server/scene-analysis';

export const runtime = 'nodejs';

const query = z.strictObject({ revision: pathId('revision').optional() });

/**
 * The engine's result for a saved revision (default: the latest), computed on the server from the stored
 * document and the truck profile version it pins. Anyone who may read the scene may read its figures.
 */
export const GET = route({ params: idParams, query }, async ({ user, params, query }) => {
  const found = await analyseSavedScene(getDb(), user, params.id, query.revision);
  if (found.kind === 'missing') throw new HttpError(404, 'Scene not found');
  if (found.kind === 'no-revision') {
    throw new HttpError(404, `query.revision: this scene has no revision ${query.revision}; the latest is ${found.latest}`, [{ path: 'query.revision', message: 'No such revision' }]);
  }
  const { analysis, cached } = found;
  const headers = { 'x-analysis-cache': cached ? 'hit' : 'miss' };
  if (!analysis.ok) {
    return Response.json({ error: analysis.message, code: analysis.code, ...(analysis.field ? { field: analysis.field } : {}), ...analysis.meta }, { status: 422, headers });
  }
  return Response.json({ ...analysis.meta, names: analysis.names, ...analysis.result }, { headers });
});
