import { getDb } from '@/db';
import { createRiggingItem, findRiggingTags } from '@/db/repositories/rigging';
import { recordAudit } from '@/db/repositories/audit';
import { route } from '@/lib/api/route';
import { parseRiggingCsv, type CsvRowError } from '@/lib/equipment/rigging-csv';
import { importSchema } from '@/lib/validations/rigging';
import { rolesFor } from '@/lib/auth/permissions';

export const runtime = 'nodejs';

const rowErrors = (errors: CsvRowError[]) =>
  Response.json(
    {
      error: `Nothing was imported: ${errors.length} problem${errors.length === 1 ? '' : 's'} in the file (first: row ${errors[0].row}, ${errors[0].field}: ${errors[0].message})`,
      rowErrors: errors,
      issues: errors.map((e) => ({ path: `csv.row${e.row}.${e.field}`, message: e.message })),
    },
    { status: 422 },
  );

/** Imports every row or none: any bad row (or a tag already in the inventory) refuses the whole file. */
export const POST = route({ roles: rolesFor('manageRigging'), body: importSchema }, async ({ user, body }) => {
  const parsed = parseRiggingCsv(body.csv);
  if (!parsed.ok) return rowErrors(parsed.errors);
  const db = getDb();
  return db.transaction().execute(async (trx) => {
    const existing = await findRiggingTags(trx, user.organisationId, parsed.items.map((i) => i.tag));
    if (existing.size) {
      const errors = parsed.items.flatMap((it, k) => (existing.has(it.tag) ? [{ row: k + 2, field: 'tag', message: `Tag ${it.tag} is already in the inventory` }] : []));
      return rowErrors(errors);
    }
    for (const it of parsed.items) await createRiggingItem(trx, user.organisationId, it);
    await recordAudit(trx, { organisationId: user.organisationId, userId: user.id, action: 'rigging.import', detail: { count: parsed.items.length } });
    return Response.json({ imported: parsed.items.length }, { status: 201 });
  });
});
