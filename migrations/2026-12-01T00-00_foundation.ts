import { sql, type Kysely } from 'kysely';
import { autoId, nowText, jsonType } from '@/db/dialect';

// Migrations use Kysely<any>: they are frozen in time and must not follow later type changes.
export async function up(db: Kysely<any>): Promise<void> {
  const now = nowText(db);

  await db.schema
    .createTable('organisations')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('slug', 'text', (c) => c.notNull().unique())
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();

  await db.schema
    .createTable('users')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('email', 'text', (c) => c.notNull().unique())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('password_hash', 'text', (c) => c.notNull())
    .addColumn('role', 'text', (c) => c.notNull().check(sql`role in ('operator','supervisor','trainer','admin')`))
    .addColumn('units', 'text', (c) => c.notNull().defaultTo('imperial').check(sql`units in ('imperial','metric')`))
    .addColumn('active', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('users_org_idx').ifNotExists().on('users').column('organisation_id').execute();

  await db.schema
    .createTable('equipment_profiles')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('unit_number', 'text')
    .addColumn('in_service', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('spec', jsonType(db), (c) => c.notNull())
    .addColumn('version', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('retired_at', 'text')
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema
    .createIndex('equipment_org_kind_idx')
    .ifNotExists()
    .on('equipment_profiles')
    .columns(['organisation_id', 'kind'])
    .execute();

  await db.schema
    .createTable('scenes')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('owner_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('title', 'text', (c) => c.notNull())
    .addColumn('status', 'text', (c) =>
      c.notNull().defaultTo('draft').check(sql`status in ('draft','submitted','approved','rejected','archived')`),
    )
    .addColumn('document', jsonType(db), (c) => c.notNull())
    .addColumn('revision', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('equipment_profile_id', 'integer', (c) => c.references('equipment_profiles.id'))
    .addColumn('equipment_profile_version', 'integer')
    .addColumn('in_training_set', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('updated_at', 'text', (c) => c.notNull().defaultTo(now))
    .addColumn('deleted_at', 'text')
    .execute();
  await db.schema.createIndex('scenes_org_idx').ifNotExists().on('scenes').columns(['organisation_id', 'deleted_at']).execute();
  await db.schema.createIndex('scenes_owner_idx').ifNotExists().on('scenes').column('owner_id').execute();

  await db.schema
    .createTable('scene_revisions')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('scene_id', 'integer', (c) => c.notNull().references('scenes.id').onDelete('cascade'))
    .addColumn('revision', 'integer', (c) => c.notNull())
    .addColumn('document', 'text', (c) => c.notNull())
    .addColumn('author_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .addUniqueConstraint('scene_revisions_scene_rev_uq', ['scene_id', 'revision'])
    .execute();

  await db.schema
    .createTable('audit_log')
    .ifNotExists()
    .addColumn('id', 'integer', autoId(db))
    .addColumn('organisation_id', 'integer', (c) => c.notNull().references('organisations.id').onDelete('cascade'))
    .addColumn('user_id', 'integer', (c) => c.notNull().references('users.id'))
    .addColumn('scene_id', 'integer', (c) => c.references('scenes.id'))
    .addColumn('action', 'text', (c) => c.notNull())
    .addColumn('detail', jsonType(db))
    .addColumn('created_at', 'text', (c) => c.notNull().defaultTo(now))
    .execute();
  await db.schema.createIndex('audit_scene_idx').ifNotExists().on('audit_log').column('scene_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ['audit_log', 'scene_revisions', 'scenes', 'equipment_profiles', 'users', 'organisations']) {
    await db.schema.dropTable(t).ifExists().execute();
  }
}
