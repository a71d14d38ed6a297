import { getDb } from '@/db';
import { idParams, route } from '@/lib/api/route';
import { decidePlan } from '@/lib/server/review';
import { REVIEWER_ROLES } from '@/lib/review/permissions';
import { decisionSchema } from '@/lib/validations/review';

export const runtime = 'nodejs';

/** A supervisor or admin approves (conditions optional) or returns a submitted plan. */
export const POST = route({ roles: REVIEWER_ROLES, params: idParams, body: decisionSchema }, async ({ user, params, body }) => {
  const out = await decidePlan(getDb(), user, params.id, body);
  return Response.json(out.body, { status: out.status });
});
