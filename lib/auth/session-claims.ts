import { cookies } from 'next/headers';
import { getServerSession } from 'next-auth';
import { decode } from 'next-auth/jwt';
import { authOptions } from './options';

export interface SessionClaims {
  userId: number;
  /** The user's session version when the session began; getCurrentUser refuses it once the version moves on. */
  sessionVersion: number;
}

/** next-auth's session cookie: the secure name when the site is served over https, the plain one otherwise. */
const COOKIE_NAMES = ['__Secure-next-auth.session-token', 'next-auth.session-token'] as const;

/**
 * The session token from a cookie jar, joined again when next-auth split a large one into chunks
 * (name.0, name.1, …, as its SessionStore does past 4 kB).
 */
export function sessionTokenFrom(cookie: (name: string) => string | undefined, names: readonly string[] = COOKIE_NAMES): string | null {
  for (const name of names) {
    const whole = cookie(name);
    if (whole) return whole;
    const chunks: string[] = [];
    for (let i = 0; ; i++) {
      const part = cookie(`${name}.${i}`);
      if (part === undefined) break;
      chunks.push(part);
    }
    if (chunks.length) return chunks.join('');
  }
  return null;
}

/**
 * The claims of a next-auth JWT, or null. The token is decrypted with the app's secret; jose refuses a
 * tampered or expired one. Reading the token directly, rather than through getServerSession, skips
 * next-auth's internal request and callbacks on every API call: the role and organisation are read from
 * the database anyway (getCurrentUser), so the session callback adds nothing here.
 */
export async function claimsFromToken(token: string | null, secret: string): Promise<SessionClaims | null> {
  if (!token) return null;
  const key = `${secret}\u0000${token}`;
  const kept = decodedTokens.get(key);
  if (kept && kept.expiresAt > Date.now()) return kept.claims;
  if (kept) decodedTokens.delete(key);
  const jwt = await decode({ token, secret }).catch(() => null);
  const id = jwt?.userId;
  const version = jwt?.sessionVersion;
  if (typeof id !== 'number' || !Number.isInteger(id)) return null;
  // A token from before session versions existed carries none: it is treated as ended.
  if (typeof version !== 'number' || !Number.isInteger(version)) return null;
  const claims = { userId: id, sessionVersion: version };
  if (typeof jwt?.exp === 'number') {
    decodedTokens.set(key, { claims, expiresAt: jwt.exp * 1000 });
    if (decodedTokens.size > DECODED_TOKENS_KEPT) decodedTokens.delete(decodedTokens.keys().next().value!);
  }
  return claims;
}

/**
 * Tokens already decrypted, with their claims, until the token's own expiry. Decrypting a token (key
 * derivation and AES-GCM) took about 5 % of a server's CPU under GET /api/me; a token is immutable, so the
 * same string decrypts to the same claims until it expires. Only accepted tokens are kept, at most this
 * many (oldest dropped first); a session's version is still checked against the database on every call.
 */
export const DECODED_TOKENS_KEPT = 1000;
const decodedTokens = new Map<string, { claims: SessionClaims; expiresAt: number }>();
/** How many decrypted tokens are kept now (for tests). */
export const keptTokenCount = () => decodedTokens.size;

/** Who the next-auth JWT says is signed in, or null. Tests replace this module. */
export async function getSessionClaims(): Promise<SessionClaims | null> {
  const secret = process.env.NEXTAUTH_SECRET;
  // Without a configured secret (a bare `next dev`), next-auth derives one of its own: ask it instead.
  if (!secret) return claimsFromSession();
  const jar = await cookies();
  return claimsFromToken(sessionTokenFrom((name) => jar.get(name)?.value), secret);
}

async function claimsFromSession(): Promise<SessionClaims | null> {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  const version = session?.user?.sessionVersion;
  if (typeof id !== 'number' || !Number.isInteger(id) || typeof version !== 'number' || !Number.isInteger(version)) return null;
  return { userId: id, sessionVersion: version };
}
