import { RateLimiterMemory, RateLimiterPostgres, type RateLimiterAbstract } from 'rate-limiter-flexible';
import type pg from 'pg';
import { getDb, postgresPoolOf } from '@/db';

/**
 * Wrong-password throttling. Each failed sign-in costs a point against the account (the e-mail typed) and
 * against the client address; a key with no points left is refused with 429 until its window ends.
 * 10 per account per minute: a person mistyping never meets it, a guesser gets 14,400 tries a day at
 * most instead of thousands a minute (OWASP Authentication Cheat Sheet, "Login Throttling"). 100 per
 * address per 15 minutes stops one machine from walking many accounts.
 * On PostgreSQL the counts live in the database (table sign_in_throttle), so every instance behind a load
 * balancer shares them; should the database not answer, each instance falls back to counting in memory
 * (rate-limiter-flexible's insurance limiter) rather than letting guesses through or refusing everyone.
 * On SQLite (one host, usually one process) they are held in memory per process. Successful sign-ins cost
 * nothing.
 */
export const ACCOUNT_FAILURES_PER_MINUTE = 10;
export const ADDRESS_FAILURES_PER_15_MIN = 100;

interface Limiters {
  account: RateLimiterAbstract;
  address: RateLimiterAbstract;
  /** The pool the counts are kept through; null: in memory. */
  pool: pg.Pool | null;
}

const RULES = {
  account: { keyPrefix: 'signin-account', points: ACCOUNT_FAILURES_PER_MINUTE, duration: 60 },
  address: { keyPrefix: 'signin-address', points: ADDRESS_FAILURES_PER_15_MIN, duration: 15 * 60 },
} as const;

/** The table the migration 2026-12-03T14-00_sign-in-throttle creates. */
export const SIGN_IN_THROTTLE_TABLE = 'sign_in_throttle';

function limiter(rule: (typeof RULES)[keyof typeof RULES], pool: pg.Pool | null): RateLimiterAbstract {
  const memory = new RateLimiterMemory(rule);
  if (!pool) return memory;
  return new RateLimiterPostgres({ ...rule, storeClient: pool, storeType: 'pool', tableName: SIGN_IN_THROTTLE_TABLE, tableCreated: true, insuranceLimiter: memory });
}

// Route bundles can load this module more than once per process; the counts must be shared.
const holder = globalThis as unknown as { arclineSignInLimiters?: Limiters };
function limiters(): Limiters {
  const pool = postgresPoolOf(getDb());
  if (!holder.arclineSignInLimiters || holder.arclineSignInLimiters.pool !== pool) {
    holder.arclineSignInLimiters = { account: limiter(RULES.account, pool), address: limiter(RULES.address, pool), pool };
  }
  return holder.arclineSignInLimiters;
}

const accountKey = (email: string) => email.trim().toLowerCase().slice(0, 254);

/** The client address as the first proxy hop recorded it; "unknown" when there is none. */
export function clientAddress(headers: { get(name: string): string | null }): string {
  const forwarded = headers.get('x-forwarded-for')?.split(',')[0]?.trim();
  return (forwarded || headers.get('x-real-ip') || 'unknown').slice(0, 64);
}

/** Seconds until this account or address may try again, or 0 when it may try now. */
export async function signInWaitSeconds(email: string, address: string): Promise<number> {
  const l = limiters();
  let ms = 0;
  for (const [limiter, key] of [
    [l.account, accountKey(email)],
    [l.address, address],
  ] as const) {
    const res = await limiter.get(key);
    if (res && res.consumedPoints >= limiter.points) ms = Math.max(ms, res.msBeforeNext);
  }
  return ms > 0 ? Math.max(1, Math.ceil(ms / 1000)) : 0;
}

export async function recordSignInFailure(email: string, address: string): Promise<void> {
  const l = limiters();
  await l.account.penalty(accountKey(email));
  await l.address.penalty(address);
}

/** What a freshly started instance knows: nothing in memory. Tests use it to stand for a second instance. */
export function forgetInstanceCounts(): void {
  delete holder.arclineSignInLimiters;
}

/** Test helper and admin escape hatch: forget every count, in memory and (on PostgreSQL) in the database. */
export async function resetSignInThrottle(): Promise<void> {
  delete holder.arclineSignInLimiters;
  const db = getDb();
  if (postgresPoolOf(db)) await db.deleteFrom('sign_in_throttle').execute();
}
