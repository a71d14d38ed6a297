import { describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import proxy from '@/proxy';
import { hasMalformedEscape } from '@/lib/security/path-escape';
import { UPLOAD_CSP } from '@/lib/security/content-security-policy';

type HeaderRule = { source: string; headers: { key: string; value: string }[] };
// A plain .mjs file without types: import it by a computed name and say what we read from it.
const configPath = '../../../next.config.mjs';
const rules = async () => ((await import(configPath)) as { default: { headers: () => Promise<HeaderRule[]> } }).default.headers();
const valueOf = (rs: HeaderRule[], source: string, key: string) => rs.find((r) => r.source === source)?.headers.find((h) => h.key === key)?.value;

describe('headers on every answer', () => {
  it('next.config sends nosniff, the referrer policy, a permissions policy and DENY framing on every path', async () => {
    const rs = await rules();
    expect(valueOf(rs, '/:path*', 'X-Content-Type-Options')).toBe('nosniff');
    expect(valueOf(rs, '/:path*', 'Referrer-Policy')).toBe('strict-origin-when-cross-origin');
    expect(valueOf(rs, '/:path*', 'Permissions-Policy')).toMatch(/camera=\(\).*geolocation=\(\)/);
    expect(valueOf(rs, '/:path*', 'X-Frame-Options')).toBe('DENY');
  });

  it('API answers are never stored and carry a deny-all CSP', async () => {
    const rs = await rules();
    expect(valueOf(rs, '/api/:path*', 'Cache-Control')).toBe('no-store');
    expect(valueOf(rs, '/api/:path*', 'Content-Security-Policy')).toBe("default-src 'none'; frame-ancestors 'none'");
  });

  it("uploaded images keep their sandboxing CSP: a later rule for their path, after the API's, says the route's own policy", async () => {
    const rs = await rules();
    const source = '/api/scenes/:id/background/:uploadId';
    expect(rs.findIndex((r) => r.source === source)).toBeGreaterThan(rs.findIndex((r) => r.source === '/api/:path*'));
    expect(valueOf(rs, source, 'Content-Security-Policy')).toBe(UPLOAD_CSP);
    expect(UPLOAD_CSP).toMatch(/(^|; )sandbox($|;)/);
  });

  it('each page gets a CSP with a fresh nonce (no unsafe-inline scripts), and Next is handed the same nonce', async () => {
    const seen = new Set<string>();
    for (const path of ['/', '/sign-in']) {
      const res = (await proxy(new NextRequest(`http://arcline.test${path}`)))!;
      const csp = res.headers.get('content-security-policy')!;
      const nonce = /'nonce-([A-Za-z0-9+/=]+)'/.exec(csp)![1];
      seen.add(nonce);
      expect(csp).toMatch(/script-src 'self' 'nonce-[^']+' 'strict-dynamic'/);
      expect(csp).toContain("frame-ancestors 'none'");
      expect(csp).toContain("object-src 'none'");
      expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
      // NextResponse.next({ request: { headers } }) passes the rewritten request headers on this header.
      expect(res.headers.get('x-middleware-request-content-security-policy')).toBe(csp);
    }
    expect(seen.size).toBe(2);
  });

  it('a signed-out visit to an app page is sent to sign-in', async () => {
    process.env.NEXTAUTH_SECRET ??= 'test-secret-not-for-production';
    const res = (await proxy(new NextRequest('http://arcline.test/scenes?x=1')))!;
    expect(res.status).toBe(307);
    const to = new URL(res.headers.get('location')!);
    expect(to.pathname).toBe('/sign-in');
    expect(to.searchParams.get('callbackUrl')).toBe('/scenes?x=1');
  });
});

describe('malformed path escapes', () => {
  it('PUT /api/scenes/%FF is a 400 naming the path, before any handler', async () => {
    const res = (await proxy(new NextRequest('http://arcline.test/api/scenes/%FF', { method: 'PUT' })))!;
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe('path');
  });

  it('tells malformed escapes from good ones', () => {
    for (const bad of ['/api/scenes/%FF', '/api/scenes/%E2%82', '/api/scenes/%G1', '/x/%']) expect(hasMalformedEscape(bad), bad).toBe(true);
    for (const good of ['/api/scenes/12', '/api/scenes/%20', '/api/scenes/%E2%82%AC', '/']) expect(hasMalformedEscape(good), good).toBe(false);
  });
});
