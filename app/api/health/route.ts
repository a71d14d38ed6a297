/**
 * Liveness for a load balancer, and the framework's own ceiling in `npm run bench:server`. It reads no
 * session, no input and no data, so it answers the same to everyone; that is why it does not go through the
 * route wrapper (which exists to check sessions, roles and input).
 */
export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export function GET() {
  return Response.json({ ok: true }, { headers: { 'cache-control': 'no-store' } });
}
