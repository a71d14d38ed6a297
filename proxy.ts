import { NextResponse, type NextRequest } from 'next/server';
import { withAuth } from 'next-auth/middleware';
import { newNonce, pageCsp } from '@/lib/security/content-security-policy';
import { hasMalformedEscape, rawPathOf } from '@/lib/security/path-escape';

/** Pages that need a session. First line of defence only: every page and route handler checks again itself. */
const GUARDED = ['/scenes', '/equipment', '/rigging', '/admin', '/training', '/review', '/settings'];
const isGuarded = (path: string) => GUARDED.some((p) => path === p || path.startsWith(`${p}/`));

function malformedPath(): NextResponse {
  return NextResponse.json({ error: 'path: contains a malformed percent-escape', issues: [{ path: 'path', message: 'Malformed percent-escape' }] }, { status: 400 });
}

/**
 * Runs before every page and API call: refuses malformed escapes (400), sends signed-out visitors of app
 * pages to sign-in, and gives each page a fresh CSP nonce. Next reads the nonce from the request's
 * Content-Security-Policy header and puts it on its own scripts; pages are rendered per request for this.
 */
export default async function proxy(req: NextRequest) {
  if (hasMalformedEscape(rawPathOf(req.url))) return malformedPath();
  if (req.nextUrl.pathname.startsWith('/api/')) return NextResponse.next();
  if (isGuarded(req.nextUrl.pathname)) {
    // next-auth's check: a redirect to sign-in (with callbackUrl) when there is no valid token, else nothing.
    const toSignIn = await (withAuth as unknown as (r: NextRequest, o: object) => Promise<NextResponse | undefined>)(req, { pages: { signIn: '/sign-in' } });
    if (toSignIn) return toSignIn;
  }
  const nonce = newNonce();
  const csp = pageCsp(nonce);
  const headers = new Headers(req.headers);
  headers.set('x-nonce', nonce);
  headers.set('content-security-policy', csp);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set('content-security-policy', csp);
  return res;
}

export const config = {
  // Everything but built assets: pages get the nonce. API paths only when they hold a '%' (the escape check):
  // while a proxy runs for a request, Next copies its body (up to 10 MB, twice) and waits for all of it
  // before the route handler starts, so a route could not refuse an oversized chunked body while it streams.
  matcher: ['/((?!_next/static|_next/image|favicon.ico|arcline-mark.svg|api/[^%]*$).*)'],
};
