import { afterEach, describe, expect, it, vi } from 'vitest';
import { encode, type JWT } from 'next-auth/jwt';
import { claimsFromToken, DECODED_TOKENS_KEPT, keptTokenCount, sessionTokenFrom } from '@/lib/auth/session-claims';

const SECRET = 'unit-test-secret-of-some-length';
/** A token as next-auth writes it; some tests leave claims out or give them the wrong type on purpose. */
const tok = (claims: Record<string, unknown>, secret = SECRET, maxAge?: number) => encode({ token: claims as unknown as JWT, secret, maxAge });

describe('session claims read straight from the next-auth JWT', () => {
  it('reads the user id and session version of a token next-auth encoded', async () => {
    const token = await tok({ userId: 42, sessionVersion: 3, role: 'operator' });
    expect(await claimsFromToken(token, SECRET)).toEqual({ userId: 42, sessionVersion: 3 });
  });

  it('refuses a token under another secret, a tampered token and an expired one', async () => {
    const token = await tok({ userId: 42, sessionVersion: 3 });
    expect(await claimsFromToken(token, 'another-secret-entirely')).toBeNull();
    const tampered = token.slice(0, -4) + (token.endsWith('AAAA') ? 'BBBB' : 'AAAA');
    expect(await claimsFromToken(tampered, SECRET)).toBeNull();
    const expired = await tok({ userId: 42, sessionVersion: 3 }, SECRET, -60);
    expect(await claimsFromToken(expired, SECRET)).toBeNull();
  });

  it('treats a token without a session version, or with a non-integer id, as no session', async () => {
    expect(await claimsFromToken(await tok({ userId: 42 }), SECRET)).toBeNull();
    expect(await claimsFromToken(await tok({ userId: '42', sessionVersion: 1 }), SECRET)).toBeNull();
    expect(await claimsFromToken(null, SECRET)).toBeNull();
  });

  it('finds the cookie by either name and joins a chunked one in order', async () => {
    const token = await tok({ userId: 7, sessionVersion: 1 });
    const plain = new Map([['next-auth.session-token', token]]);
    expect(sessionTokenFrom((n) => plain.get(n))).toBe(token);
    const secure = new Map([['__Secure-next-auth.session-token', token]]);
    expect(sessionTokenFrom((n) => secure.get(n))).toBe(token);
    const cut = Math.floor(token.length / 2);
    const chunked = new Map([
      ['next-auth.session-token.1', token.slice(cut)],
      ['next-auth.session-token.0', token.slice(0, cut)],
    ]);
    const joined = sessionTokenFrom((n) => chunked.get(n));
    expect(joined).toBe(token);
    expect(await claimsFromToken(joined, SECRET)).toEqual({ userId: 7, sessionVersion: 1 });
    expect(sessionTokenFrom(() => undefined)).toBeNull();
  });

  describe('decrypted tokens kept until they expire', () => {
    afterEach(() => vi.useRealTimers());

    it('answers a kept token only under its own secret, and never past its expiry', async () => {
      const token = await tok({ userId: 9, sessionVersion: 2 }, SECRET, 60);
      expect(await claimsFromToken(token, SECRET)).toEqual({ userId: 9, sessionVersion: 2 });
      // Kept now: another secret still does not open it.
      expect(await claimsFromToken(token, 'another-secret-entirely')).toBeNull();
      expect(await claimsFromToken(token, SECRET)).toEqual({ userId: 9, sessionVersion: 2 });
      vi.useFakeTimers({ toFake: ['Date'] });
      // Past the expiry and next-auth's 15 s clock tolerance.
      vi.setSystemTime(Date.now() + 80_000);
      expect(await claimsFromToken(token, SECRET)).toBeNull();
    });

    it('keeps no more than DECODED_TOKENS_KEPT tokens, and a refused token is never kept', async () => {
      const before = keptTokenCount();
      const first = await tok({ userId: 1, sessionVersion: 1 }, SECRET, 60);
      expect(await claimsFromToken(first, SECRET)).not.toBeNull();
      expect(keptTokenCount()).toBe(before + 1);
      const tampered = first.slice(0, -4) + (first.endsWith('AAAA') ? 'BBBB' : 'AAAA');
      expect(await claimsFromToken(tampered, SECRET)).toBeNull();
      expect(await claimsFromToken(tampered, SECRET)).toBeNull();
      expect(keptTokenCount()).toBe(before + 1);
      const others = await Promise.all(Array.from({ length: DECODED_TOKENS_KEPT }, (_, i) => tok({ userId: 100 + i, sessionVersion: 1 }, SECRET, 600)));
      for (const t of others) await claimsFromToken(t, SECRET);
      expect(keptTokenCount()).toBe(DECODED_TOKENS_KEPT);
    });
  });
});
