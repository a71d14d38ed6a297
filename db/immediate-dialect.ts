import type BetterSqlite3 from 'better-sqlite3';
import { CompiledQuery, SqliteDialect, SqliteDriver, type DatabaseConnection, type Driver, type QueryResult, type SqliteDatabase, type SqliteDialectConfig } from 'kysely';

/**
 * The busy timeout: how long a write waits for another connection (a second server process, a migration,
 * a backup) to release the write lock before the request gives up with 503. The wait is asynchronous, so
 * this process keeps answering other requests meanwhile.
 */
export const WRITE_LOCK_WAIT_MS = 5000;
/**
 * SQLite's own busy timeout, spent inside each attempt. better-sqlite3 waits for it synchronously (the
 * whole process pauses), so it is kept short and the rest of the wait is the async retry above.
 */
export const STATEMENT_BUSY_TIMEOUT_MS = 20;

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const isBusy = (err: unknown) => String((err as { code?: unknown } | null)?.code ?? '').startsWith('SQLITE_BUSY');

/**
 * Retries a statement refused with SQLITE_BUSY, with a growing pause, until WRITE_LOCK_WAIT_MS has passed;
 * then SQLITE_BUSY reaches the route wrapper, which answers 503 with Retry-After. Only outside an open
 * transaction: a statement that got SQLITE_BUSY there did nothing, so running it again is safe. Inside
 * one (after BEGIN IMMEDIATE) this connection already holds the write lock and is never busy.
 */
class RetryingConnection implements DatabaseConnection {
  constructor(
    private readonly inner: DatabaseConnection,
    private readonly sqlite: BetterSqlite3.Database,
  ) {}

  async executeQuery<R>(query: CompiledQuery): Promise<QueryResult<R>> {
    const deadline = Date.now() + WRITE_LOCK_WAIT_MS;
    for (let pause = 5; ; pause = Math.min(pause * 2, 100)) {
      try {
        return await this.inner.executeQuery<R>(query);
      } catch (err) {
        if (!isBusy(err) || this.sqlite.inTransaction || Date.now() + pause > deadline) throw err;
        await sleep(pause);
      }
    }
  }

  streamQuery<R>(query: CompiledQuery, chunkSize?: number): AsyncIterableIterator<QueryResult<R>> {
    return this.inner.streamQuery<R>(query, chunkSize);
  }
}

/**
 * Starts every transaction with BEGIN IMMEDIATE: the write lock is taken up front, so a transaction never
 * reads first and then fails to upgrade to a writer (a deferred BEGIN's SQLITE_BUSY that no waiting can
 * resolve, because the other writer may be waiting on this reader's snapshot).
 */
class ImmediateSqliteDriver extends SqliteDriver {
  #wrapped = new WeakMap<DatabaseConnection, RetryingConnection>();

  constructor(
    config: SqliteDialectConfig,
    private readonly sqlite: BetterSqlite3.Database,
  ) {
    super(config);
  }

  override async acquireConnection(): Promise<DatabaseConnection> {
    const conn = await super.acquireConnection();
    let wrapped = this.#wrapped.get(conn);
    if (!wrapped) this.#wrapped.set(conn, (wrapped = new RetryingConnection(conn, this.sqlite)));
    return wrapped;
  }

  override async beginTransaction(connection: DatabaseConnection): Promise<void> {
    await connection.executeQuery(CompiledQuery.raw('begin immediate'));
  }
}

/** Prepared statements kept per connection, by SQL text. A list page runs about six distinct statements. */
export const STATEMENT_CACHE_SIZE = 256;

/**
 * The connection as Kysely sees it, with its prepared statements kept and reused by SQL text (least recently
 * used dropped past `size`). Kysely prepares every query afresh, and preparing was 2.5 % of a server's CPU
 * under GET /api/me. A statement still being iterated (a streamed query) is not shared: the next run of the
 * same SQL gets a fresh one. SQLite re-prepares a kept statement itself after a schema change.
 */
export function withStatementCache(sqlite: BetterSqlite3.Database, size = STATEMENT_CACHE_SIZE): SqliteDatabase & { readonly cached: number } {
  const kept = new Map<string, BetterSqlite3.Statement>();
  return {
    close: () => sqlite.close(),
    get cached() {
      return kept.size;
    },
    prepare(sqlText: string) {
      const hit = kept.get(sqlText);
      if (hit && !hit.busy) {
        kept.delete(sqlText);
        kept.set(sqlText, hit);
        return hit;
      }
      const stmt = sqlite.prepare(sqlText);
      if (hit) return stmt;
      kept.set(sqlText, stmt);
      if (kept.size > size) kept.delete(kept.keys().next().value!);
      return stmt;
    },
  };
}

export class ImmediateSqliteDialect extends SqliteDialect {
  readonly #sqlite: BetterSqlite3.Database;
  readonly #config: SqliteDialectConfig;

  constructor(config: SqliteDialectConfig & { database: BetterSqlite3.Database }) {
    const kept = { ...config, database: withStatementCache(config.database) };
    super(kept);
    this.#config = kept;
    this.#sqlite = config.database;
  }
  override createDriver(): Driver {
    return new ImmediateSqliteDriver(this.#config, this.#sqlite);
  }
}
