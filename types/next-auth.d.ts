import type { Role } from '@/lib/domain';
import 'next-auth';
import 'next-auth/jwt';

declare module 'next-auth' {
  interface User {
    role: Role;
    organisationId: number;
    sessionVersion: number;
  }
  interface Session {
    user: {
      id: number;
      name?: string | null;
      email?: string | null;
      role: Role;
      organisationId: number;
      /** The user's session version when this session began; a raised version ends it. */
      sessionVersion: number;
    };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    userId: number;
    role: Role;
    organisationId: number;
    sessionVersion: number;
  }
}
