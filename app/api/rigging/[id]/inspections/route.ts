import { getDb } from '@/db';
import { findRiggingItem, listInspections, recordInspection } from '@/db/repositories/rigging';
import { recordAudit } from '@/db/repositories/audit';
import { idParams, route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { inspectionSchema } from '@/lib/validations/rigging';
import { rolesFor } from '@/lib/auth/permissions';
import { today } from '@/lib/dates';

export const runtime = 'nodejs';

const notFound = () => new HttpError(404, 'Rigging item not found');

export const GET = route({ params: idParams }, async ({ user, params }) => {
  const db = getDb();
  if (!(await findRiggingItem(db, user.organisationId, params.id))) throw notFound();
  return { items: await listInspections(db, user.organisationId, params.id) };
});

export const POST = route({ roles: rolesFor('manageRigging'), params: idParams, body: inspectionSchema }, async ({ user, params, body }) => {
  if (body.inspectedOn > today()) throw new HttpError(400, 'inspectedOn: an inspection cannot be dated in the future', [{ path: 'inspectedOn', message: 'In the future' }]);
  if (body.nextDue && body.nextDue <= body.inspectedOn) throw new HttpError(400, 'nextDue: the next inspection must be after this one', [{ path: 'nextDue', message: 'Not after the inspection date' }]);
  const item = await getDb()
    .transaction()
    .execute(async (trx) => {
      const found = await findRiggingItem(trx, user.organisationId, params.id);
      if (!found) throw notFound();
      if (found.status === 'retired') throw new HttpError(409, 'This item is retired; inspections are not recorded for retired items');
      await recordInspection(trx, user.organisationId, params.id, user.id, body);
      await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'rigging.inspect', detail: { id: params.id, result: body.result } });
      return (await findRiggingItem(trx, user.organisationId, params.id))!;
    });
  return Response.json(item, { status: 201 });
});
