import { getDb } from '@/db';
import { idParams, route } from '@/lib/api/route';
import { withdrawPlan } from '@/lib/server/review';

export const runtime = 'nodejs';

/** The plan's operator takes a submitted plan back to draft. */
export const POST = route({ roles: ['operator'], params: idParams }, async ({ user, params }) => {
  const out = await withdrawPlan(getDb(), user, params.id);
  return Response.json(out.body, { status: out.status });
});
