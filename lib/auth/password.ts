import bcrypt from 'bcryptjs';

// Cost 10 keeps sign-in near 60 ms on this class of machine; seeds and tests use the same function.
const COST = 10;

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}
