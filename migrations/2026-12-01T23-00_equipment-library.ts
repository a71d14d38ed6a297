import { sql, type Kysely } from 'kysely';
import { autoId, nowText, doubleType, jsonType } from '@/db/dialect';

// Profile versions (one row per saved version, kept for ever), rigging items and their inspections.
export async function up(db: Kysely<any>): Promise<void> {
  const now = nowText(db);

  await db.schema
    .createTable('equipment_profile_versions')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('profile_id', 'integer', (c) => c.notNull().references('equipment_profiles.id').onDelete('cascade'))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('version', 'integer', (c) => c.notNull())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('unit_number', 'text')
    .addColumn('in_service', 'integer', (c) => c.notNull())
    .addColumn('spec', jsonType(db), (c) => c.notNull())
    .addColumn('author_id', 'integer', (c) => c.references('users.id'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('equipment_versions_profile_version_uq', ['profile_id', 'version'])
    .execute();
  // Profiles that existed before versions were kept get their current state as their first stored version.
  await sql`insert into equipment_profile_versions (profile_id, organisation_id, version, name, unit_number, in_service, spec, created_at)
    select id, organisation_id, version, name, unit_number, in_service, spec, updated_at from equipment_profiles`.execute(db);

  await db.schema
    .createTable('rigging_items')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('tag', 'text', (c) => c.notNull())
    .addColumn('kind', 'text', (c) =>
      c.notNull().check(sql`kind in ('round-sling','web-sling','wire-rope-sling','chain','shackle','snatch-block','hook','recovery-strap')`),
    )
    .addColumn('size', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('length', doubleType(db))
    .addColumn('rating_vertical', doubleType(db))
    .addColumn('rating_choker', doubleType(db))
    .addColumn('rating_basket', doubleType(db))
    .addColumn('rating_source', 'text', (c) => c.notNull().defaultTo('entered'))
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('in_service').check(sql`status in ('in_service','tagged_out','retired')`))
    .addColumn('last_inspection', 'text')
    .addColumn('next_inspection_due', 'text')
    .addColumn('notes', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('rigging_items_org_tag_uq', ['organisation_id', 'tag'])
    .execute();
  await db.schema.createIndex('rigging_items_org_status_idx').ifNotExists().on('rigging_items').columns(['organisation_id', 'status']).execute();

  await db.schema
    .createTable('rigging_inspections')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('item_id', 'integer', (c) => c.notNull().references('rigging_items.id').onDelete('cascade'))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('inspected_on', 'text', (c) => c.notNull())
    .addColumn('inspector_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('result', 'text', (c) => c.notNull().check(sql`result in ('pass','fail')`))
    .addColumn('notes', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('next_due', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('rigging_inspections_item_idx').ifNotExists().on('rigging_inspections').column('item_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ['rigging_inspections', 'rigging_items', 'equipment_profile_versions']) await db.schema.dropTable(t).ifExists().execute();
}
