import { getDb } from '@/db';
import { createRiggingItem, listRiggingItems } from '@/db/repositories/rigging';
import { recordAudit } from '@/db/repositories/audit';
import { route } from '@/lib/api/route';
import { riggingItemSchema, riggingListQuery } from '@/lib/validations/rigging';
import { resolvedOr400, tagConflict } from './shared';
import { rolesFor } from '@/lib/auth/permissions';
import { today } from '@/lib/dates';

export const runtime = 'nodejs';

export const GET = route({ query: riggingListQuery }, async ({ user, query }) => {
  return { items: await listRiggingItems(getDb(), user.organisationId, { ...query, today: today() }), today: today() };
});

export const POST = route({ roles: rolesFor('manageRigging'), body: riggingItemSchema }, async ({ user, body }) => {
  const item = resolvedOr400(body);
  const created = await getDb()
    .transaction()
    .execute(async (trx) => {
      const row = await createRiggingItem(trx, user.organisationId, item).catch((e) => tagConflict(e, item.tag));
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'rigging.create', detail: { id: row.id, tag: row.tag } });
      return row;
    });
  return Response.json(created, { status: 201 });
});
