/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  // better-sqlite3 is native; concaveman (inside @turf/convex) breaks when bundled into route handlers; the PDF
  // renderer loads its fonts and layout engine at run time on the server.
  serverExternalPackages: ['better-sqlite3', 'concaveman', '@react-pdf/renderer'],
  poweredByHeader: false,
  // forbidden() and forbidden.tsx: pages a role may not see answer 403, not 200.
  experimental: { authInterrupts: true },
};
export default nextConfig;
