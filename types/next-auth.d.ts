import type { Role } from '@/lib/domain';
import 'next-auth';
import 'next-auth/jwt';

declare module 'next-auth' {
  interface User {
    role: Role;
    organisationId: number;
  }
  interface Session {
    user: {
      id: number;
      name?: string | null;
      email?: string | null;
      role: Role;
      organisationId: number;
    };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    userId: number;
    role: Role;
    organisationId: number;
  }
}
