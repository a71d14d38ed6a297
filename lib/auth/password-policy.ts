import { z } from 'zod';
import { COMMON_LONG_PASSWORDS, COMMON_PASSWORD_STEMS } from './common-passwords';

/** NIST SP 800-63B §5.1.1.2 asks for at least 8 and allows more; 12 is our floor for shared-organisation data. */
export const PASSWORD_MIN_CHARS = 12;
export const PASSWORD_MAX_CHARS = 128;
/** bcrypt reads only the first 72 bytes: a longer password would be silently cut, so it is refused instead. */
export const PASSWORD_MAX_BYTES = 72;

const stems = new Set(COMMON_PASSWORD_STEMS);
const longOnes = new Set(COMMON_LONG_PASSWORDS);

/** The password with digits, punctuation and spaces trimmed from both ends (how common passwords get "strengthened"). */
const core = (p: string) => p.replace(/^[\d\W_]+|[\d\W_]+$/gu, '');

/** True for a password on the shipped common list, or one of its stems with only digits or symbols around it. */
export function isCommonPassword(password: string): boolean {
  const lower = password.toLowerCase();
  if (longOnes.has(lower) || stems.has(lower)) return true;
  const stem = core(lower);
  if (stem === '') return true; // only digits and symbols: "123456789012", "!!!!!!!!!!!!"
  if (stems.has(stem)) return true;
  // A stem typed twice or more ("passwordpassword", "qwertyqwerty1"), or one character repeated.
  if (/^(.+?)\1+$/u.test(stem) && (stems.has(stem.match(/^(.+?)\1+$/u)![1]) || new Set(stem).size === 1)) return true;
  return false;
}

export const utf8Bytes = (s: string) => new TextEncoder().encode(s).byteLength;

/** The one password rule, for the create-user form, the admin API and password changes. */
export const passwordSchema = z
  .string({ error: 'Password is required' })
  .min(PASSWORD_MIN_CHARS, `Password needs at least ${PASSWORD_MIN_CHARS} characters`)
  .max(PASSWORD_MAX_CHARS, `Password can have at most ${PASSWORD_MAX_CHARS} characters`)
  .refine((p) => utf8Bytes(p) <= PASSWORD_MAX_BYTES, `Password is longer than ${PASSWORD_MAX_BYTES} bytes (accented letters and symbols count as 2–4); shorten it`)
  .refine((p) => !isCommonPassword(p), 'This password is on the list of commonly used passwords; choose another');
