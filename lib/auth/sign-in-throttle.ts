import { RateLimiterMemory } from 'rate-limiter-flexible';

/**
 * Wrong-password throttling. Each failed sign-in costs a point against the account (the e-mail typed) and
 * against the client address; a key with no points left is refused with 429 until its window ends.
 * 10 per account per minute: a person mistyping never meets it, a guesser gets 14,400 tries a day at
 * most instead of thousands a minute (OWASP Authentication Cheat Sheet, "Login Throttling"). 100 per
 * address per 15 minutes stops one machine from walking many accounts.
 * Held in memory, per server process: with N processes behind one address a guesser gets N times the
 * attempts, which is still throttled. Successful sign-ins cost nothing.
 */
export const ACCOUNT_FAILURES_PER_MINUTE = 10;
export const ADDRESS_FAILURES_PER_15_MIN = 100;

interface Limiters {
  account: RateLimiterMemory;
  address: RateLimiterMemory;
}
// Route bundles can load this module more than once per process; the counts must be shared.
const holder = globalThis as unknown as { arclineSignInLimiters?: Limiters };
function limiters(): Limiters {
  holder.arclineSignInLimiters ??= {
    account: new RateLimiterMemory({ keyPrefix: 'signin-account', points: ACCOUNT_FAILURES_PER_MINUTE, duration: 60 }),
    address: new RateLimiterMemory({ keyPrefix: 'signin-address', points: ADDRESS_FAILURES_PER_15_MIN, duration: 15 * 60 }),
  };
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

/** Test helper and admin escape hatch: forget every count. */
export function resetSignInThrottle(): void {
  delete holder.arclineSignInLimiters;
}
