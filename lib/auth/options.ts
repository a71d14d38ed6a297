import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { z } from 'zod';
import { getDb } from '@/db';
import { findUserByEmail } from '@/db/repositories/users';
import { verifyPassword } from './password';

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().email().max(254),
  password: z.string().min(1).max(200),
});

export const authOptions: NextAuthOptions = {
  session: { strategy: 'jwt', maxAge: 60 * 60 * 12 },
  pages: { signIn: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'Arcline account',
      credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
      async authorize(raw) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) return null;
        const user = await findUserByEmail(getDb(), parsed.data.email);
        if (!user || !user.active) return null;
        if (!(await verifyPassword(parsed.data.password, user.password_hash))) return null;
        return {
          id: String(user.id),
          name: user.name,
          email: user.email,
          role: user.role,
          organisationId: user.organisation_id,
        };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.userId = Number(user.id);
        token.role = user.role;
        token.organisationId = user.organisationId;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        session.user.id = token.userId;
        session.user.role = token.role;
        session.user.organisationId = token.organisationId;
      }
      return session;
    },
  },
};
