import { getDb } from '@/db';
import { listRiggingItems } from '@/db/repositories/rigging';
import { route } from '@/lib/api/route';
import { riggingToCsv } from '@/lib/equipment/rigging-csv';
import { riggingListQuery } from '@/lib/validations/rigging';
import { today } from '@/lib/dates';

export const runtime = 'nodejs';

/** The inventory (with the same filters as the list) as CSV in the import format. */
export const GET = route({ query: riggingListQuery }, async ({ user, query }) => {
  const items = await listRiggingItems(getDb(), user.organisationId, { ...query, today: today() });
  return new Response(riggingToCsv(items), {
    headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="rigging-${today()}.csv"` },
  });
});
