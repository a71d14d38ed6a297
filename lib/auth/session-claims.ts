import { getServerSession } from 'next-auth';
import { authOptions } from './options';

export interface SessionClaims {
  userId: number;
  /** The user's session version when the session began; getCurrentUser refuses it once the version moves on. */
  sessionVersion: number;
}

/** Who the next-auth JWT says is signed in, or null. Tests replace this module. */
export async function getSessionClaims(): Promise<SessionClaims | null> {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  const version = session?.user?.sessionVersion;
  if (typeof id !== 'number' || !Number.isInteger(id)) return null;
  // A token from before session versions existed carries none: it is treated as ended.
  if (typeof version !== 'number' || !Number.isInteger(version)) return null;
  return { userId: id, sessionVersion: version };
}
