import { withAuth } from 'next-auth/middleware';

// First line of defence only: every page and route handler checks the session, role and organisation itself.
export default withAuth({ pages: { signIn: '/sign-in' } });

export const config = {
  matcher: ['/scenes/:path*', '/equipment/:path*', '/rigging/:path*', '/admin/:path*', '/training/:path*', '/review/:path*', '/settings/:path*'],
};
