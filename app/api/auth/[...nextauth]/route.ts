import NextAuth from 'next-auth';
import { authOptions } from '@/lib/auth/options';
import { clientAddress, signInWaitSeconds } from '@/lib/server/sign-in-throttle';

export const runtime = 'nodejs';

const nextAuth = NextAuth(authOptions);
type Ctx = { params: Promise<{ nextauth: string[] }> };

/**
 * next-auth's own routes, with its CSRF token. A credentials sign-in from an account or address that has
 * used up its wrong-password allowance is answered 429 with Retry-After before the password is looked at.
 * The body keeps next-auth's `{ url }` shape so its client reports `error=TooManyAttempts`.
 */
async function handler(req: Request, ctx: Ctx): Promise<Response> {
  const { nextauth } = await ctx.params;
  if (req.method === 'POST' && nextauth?.[0] === 'callback' && nextauth[1] === 'credentials') {
    const form = new URLSearchParams(await req.clone().text().catch(() => ''));
    const wait = await signInWaitSeconds(form.get('email') ?? '', clientAddress(req.headers));
    if (wait > 0) {
      const base = process.env.NEXTAUTH_URL ?? new URL(req.url).origin;
      return Response.json(
        { error: `Too many wrong passwords; try again in ${wait} s`, url: `${base}/sign-in?error=TooManyAttempts` },
        { status: 429, headers: { 'Retry-After': String(wait), 'Cache-Control': 'no-store' } },
      );
    }
  }
  return nextAuth(req, ctx);
}

export { handler as GET, handler as POST };
