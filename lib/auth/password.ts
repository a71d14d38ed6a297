import bcrypt from 'bcryptjs';

// Cost 10 keeps sign-in near 60 ms on this class of machine; seeds and tests use the same function.
const COST = 10;

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}

// Made once per process, at the same cost as real hashes, so comparing against it takes as long.
let dummy: Promise<string> | null = null;

/**
 * Spends the time a real comparison would, for an address with no usable account, so a sign-in answers
 * no faster for an unknown address than for a wrong password (no enumeration by timing). Always false.
 */
export async function verifyAgainstDummy(plain: string): Promise<false> {
  dummy ??= bcrypt.hash('arcline dummy hash for unknown accounts', COST);
  await bcrypt.compare(plain, await dummy);
  return false;
}
