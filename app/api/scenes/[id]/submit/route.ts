import { getDb } from '@/db';
import { idParams, route } from '@/lib/api/route';
import { submitPlan } from '@/lib/server/review';
import { submitSchema } from '@/lib/validations/review';

export const runtime = 'nodejs';

/** The plan's operator submits a revision for review; the server computes it and keeps the figures. */
export const POST = route({ roles: ['operator'], params: idParams, body: submitSchema }, async ({ user, params, body }) => {
  const out = await submitPlan(getDb(), user, params.id, body.revision);
  return Response.json(out.body, { status: out.status });
});
