import { getDb } from '@/db';
import { idParams, route } from '@/lib/api/route';
import { startNewRevision } from '@/lib/server/review';

export const runtime = 'nodejs';

/** The plan's operator starts a new draft revision of an approved plan; the approval stays with the old one. */
export const POST = route({ roles: ['operator'], params: idParams }, async ({ user, params }) => {
  const out = await startNewRevision(getDb(), user, params.id);
  return Response.json(out.body, { status: out.status });
});
