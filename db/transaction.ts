import type { Kysely, Transaction } from 'kysely';

/**
 * Runs `fn` in a transaction, joining the caller's if `db` already is one. On SQLite every transaction begins
 * with BEGIN IMMEDIATE and waits up to the busy timeout for another process's write lock (db/immediate-dialect.ts);
 * past it, SQLITE_BUSY becomes a 503 with Retry-After in the route wrapper. On PostgreSQL it is a plain BEGIN
 * (READ COMMITTED) on one pooled connection; a row lock waited for past lock_timeout is the same 503. Kysely refuses nested
 * transactions, so repository functions use this to stay composable inside a route's own transaction.
 * Inside `fn`, use only `trx`: the SQLite driver has one connection, and a query on the outer instance
 * would wait for the transaction that is waiting for it.
 */
export function inTransaction<DB, T>(db: Kysely<DB>, fn: (trx: Transaction<DB>) => Promise<T>): Promise<T> {
  if (db.isTransaction) return fn(db as Transaction<DB>);
  return db.transaction().execute(fn);
}
