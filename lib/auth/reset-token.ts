import { createHash, randomBytes } from 'node:crypto';

/** 32 random bytes as base64url: 43 characters, 256 bits, so guessing one is out of the question. */
export function newResetToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashResetToken(token) };
}

/** Only this is stored: a database copy then cannot be turned into a working link. */
export function hashResetToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
