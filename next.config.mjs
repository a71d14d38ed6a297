/**
 * Headers on every answer (pages, API, assets). The page CSP carries a per-request nonce, so proxy.ts sets
 * it; API answers get a fixed deny-all CSP and `no-store` here (they hold organisation data).
 */
const everywhere = [
  { key: 'X-Content-Type-Options', value: 'nosniff' },
  { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
  // Arcline uses none of these; the plan view only needs pointer input.
  { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), payment=(), usb=(), serial=(), bluetooth=(), interest-cohort=()' },
  // For browsers without CSP frame-ancestors.
  { key: 'X-Frame-Options', value: 'DENY' },
];

/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  // better-sqlite3 is native; concaveman (inside @turf/convex) breaks when bundled into route handlers; the PDF
  // renderer loads its fonts and layout engine at run time on the server; pino loads its transports by file name.
  serverExternalPackages: ['better-sqlite3', 'concaveman', '@react-pdf/renderer', 'pino'],
  poweredByHeader: false,
  // forbidden() and forbidden.tsx: pages a role may not see answer 403, not 200.
  experimental: { authInterrupts: true },
  async headers() {
    return [
      { source: '/:path*', headers: everywhere },
      {
        source: '/api/:path*',
        headers: [
          { key: 'Cache-Control', value: 'no-store' },
          { key: 'Content-Security-Policy', value: "default-src 'none'; frame-ancestors 'none'" },
        ],
      },
      // Uploaded images: a header set here replaces the one the route handler sets, so the rule above would
      // take away their sandbox. This later rule wins for these paths. The same text as UPLOAD_CSP in
      // lib/security/content-security-policy.ts (a .mjs config cannot import it; a unit test keeps them equal).
      {
        source: '/api/scenes/:id/background/:uploadId',
        headers: [{ key: 'Content-Security-Policy', value: "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; frame-ancestors 'none'; sandbox" }],
      },
    ];
  },
};
export default nextConfig;
