import { getDb } from '@/db';
import { findRiggingItem, updateRiggingItem } from '@/db/repositories/rigging';
import { recordAudit } from '@/db/repositories/audit';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { riggingItemSchema } from '@/lib/validations/rigging';
import { resolvedOr400, tagConflict } from '../shared';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

const notFound = () => new HttpError(404, 'Rigging item not found');

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const item = await findRiggingItem(getDb(), user.organisationId, params.id);
  if (!item) throw notFound();
  return item;
});

export const PUT = route({ roles: rolesFor('manageRigging'), params: idParams, body: riggingItemSchema }, async ({ user, params, body }) => {
  return getDb()
    .transaction()
    .execute(async (trx) => {
      const stored = await findRiggingItem(trx, user.organisationId, params.id);
      if (!stored) throw notFound();
      const item = resolvedOr400(body, stored);
      const row = await updateRiggingItem(trx, user.organisationId, params.id, item).catch((e) => tagConflict(e, item.tag));
      if (!row) throw notFound();
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'rigging.update', detail: { id: row.id, status: row.status } });
      return row;
    });
});
