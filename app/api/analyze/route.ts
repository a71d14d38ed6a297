import { route } from '@/lib/api/route';
import { analyzeLift, isLiftError, liftInputSchema } from '@/lib/lift';

export const runtime = 'nodejs';

/**
 * Stateless analysis of a planned lift for any signed-in user. The body is the engine's input contract;
 * input the engine cannot analyse (too few supports, a tip with no load, ...) answers 422 { error, code }.
 */
export const POST = route({ body: liftInputSchema }, async ({ body }) => {
  try {
    return analyzeLift(body);
  } catch (err) {
    if (isLiftError(err)) return Response.json(err.toJSON(), { status: 422 });
    throw err;
  }
});
