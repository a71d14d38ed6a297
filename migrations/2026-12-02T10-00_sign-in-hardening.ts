import { sql, type Kysely } from 'kysely';
import { isPostgres } from '@/db/dialect';

/**
 * Users: a session version (raised to end every session of a user at once), and e-mail unique within an
 * organisation instead of across all of them, so an admin creating an account learns nothing about other
 * organisations' addresses. SQLite cannot drop a column's UNIQUE, so the table is rebuilt (SQLite's
 * documented twelve-step ALTER procedure: foreign keys off, copy, drop, rename, check, foreign keys on).
 * PostgreSQL alters the table in place (the migrator runs this inside a transaction there).
 */
export async function up(db: Kysely<any>): Promise<void> {
  if (isPostgres(db)) {
    await sql`alter table users add column session_version integer not null default 0`.execute(db);
    // The column's UNIQUE from the foundation migration carries PostgreSQL's default name.
    await sql`alter table users drop constraint users_email_key`.execute(db);
    await sql`create unique index users_org_email_idx on users (organisation_id, email)`.execute(db);
    await sql`create index users_email_idx on users (email)`.execute(db);
    return;
  }
  await sql`pragma foreign_keys = off`.execute(db);
  try {
    await db.transaction().execute(async (trx) => {
      await sql`
        create table users_new (
          id integer primary key autoincrement,
          organisation_id integer not null references organisations(id) on delete cascade,
          email text not null,
          name text not null,
          password_hash text not null,
          role text not null check (role in ('operator','supervisor','trainer','admin')),
          units text not null default 'imperial' check (units in ('imperial','metric')),
          active integer not null default 1,
          created_at text not null default (strftime('%Y-%m-%dT%H:%M:%fZ', 'now')),
          session_version integer not null default 0
        )`.execute(trx);
      await sql`insert into users_new (id, organisation_id, email, name, password_hash, role, units, active, created_at)
        select id, organisation_id, email, name, password_hash, role, units, active, created_at from users`.execute(trx);
      await sql`drop table users`.execute(trx);
      await sql`alter table users_new rename to users`.execute(trx);
      await sql`create index users_org_idx on users (organisation_id)`.execute(trx);
      await sql`create unique index users_org_email_idx on users (organisation_id, email)`.execute(trx);
      await sql`create index users_email_idx on users (email)`.execute(trx);
      const broken = await sql`pragma foreign_key_check`.execute(trx);
      if (broken.rows.length) throw new Error(`users rebuild left ${broken.rows.length} broken foreign keys`);
    });
  } finally {
    await sql`pragma foreign_keys = on`.execute(db);
  }
}

export async function down(): Promise<void> {
  throw new Error('Not reversible: e-mail addresses may now repeat across organisations');
}
