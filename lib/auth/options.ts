import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { z } from 'zod';
import { getDb } from '@/db';
import { endUserSessions, findUsersByEmail } from '@/db/repositories/users';
import { verifyAgainstDummy, verifyPassword } from './password';
import { PASSWORD_MAX_CHARS } from './password-policy';
import { clientAddress, recordSignInFailure } from '@/lib/server/sign-in-throttle';

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().email().max(254),
  password: z.string().min(1).max(PASSWORD_MAX_CHARS),
});

type HeaderBag = Record<string, string | string[] | undefined> | undefined;
const headerGetter = (headers: HeaderBag) => ({
  get: (name: string) => {
    const v = headers?.[name] ?? headers?.[name.toLowerCase()];
    return Array.isArray(v) ? (v[0] ?? null) : (v ?? null);
  },
});

/**
 * Checks an e-mail and password. Every path costs one bcrypt comparison or more (unknown addresses and
 * inactive accounts compare against a dummy hash), so the answer's timing does not tell whether an
 * account exists. An address may belong to accounts in several organisations: the password picks one.
 */
export async function checkCredentials(raw: unknown, address: string) {
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success) {
    await verifyAgainstDummy(typeof (raw as { password?: unknown })?.password === 'string' ? String((raw as { password: string }).password).slice(0, PASSWORD_MAX_CHARS) : '');
    return null;
  }
  const { email, password } = parsed.data;
  const candidates = (await findUsersByEmail(getDb(), email)).filter((u) => u.active);
  let match: (typeof candidates)[number] | null = null;
  if (candidates.length === 0) await verifyAgainstDummy(password);
  for (const u of candidates) if ((await verifyPassword(password, u.password_hash)) && !match) match = u;
  if (!match) {
    await recordSignInFailure(email, address);
    return null;
  }
  return {
    id: String(match.id),
    name: match.name,
    email: match.email,
    role: match.role,
    organisationId: match.organisation_id,
    sessionVersion: match.session_version,
  };
}

export const authOptions: NextAuthOptions = {
  session: { strategy: 'jwt', maxAge: 60 * 60 * 12 },
  pages: { signIn: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'Arcline account',
      credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(raw, req) {
        return checkCredentials(raw, clientAddress(headerGetter(req?.headers as HeaderBag)));
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.userId = Number(user.id);
        token.role = user.role;
        token.organisationId = user.organisationId;
        token.sessionVersion = user.sessionVersion;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        session.user.id = token.userId;
        session.user.role = token.role;
        session.user.organisationId = token.organisationId;
        session.user.sessionVersion = token.sessionVersion;
      }
      return session;
    },
  },
  events: {
    // Signing out ends the session on the server too (every session of this user), not just the cookie.
    async signOut({ token }) {
      const { userId, sessionVersion } = (token ?? {}) as { userId?: unknown; sessionVersion?: unknown };
      if (Number.isInteger(userId) && Number.isInteger(sessionVersion)) await endUserSessions(getDb(), userId as number, sessionVersion as number);
    },
  },
};
