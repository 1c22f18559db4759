// Password rules (OWASP ASVS 4.0 V2.1): at least 12 characters, at most 72 bytes (bcrypt reads
// no further, so a longer one would be silently cut), and not one of the 49,233 most common
// passwords in the list @zxcvbn-ts/language-common ships.
import { dictionary } from '@zxcvbn-ts/language-common';

const COMMON = new Set((dictionary['passwords-common'] as string[]).map((p) => p.toLowerCase()));

export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_BYTES = 72;

export function passwordProblem(password: string): string | null {
  if ([...password].length < PASSWORD_MIN_LENGTH) return `Use at least ${PASSWORD_MIN_LENGTH} characters`;
  if (Buffer.byteLength(password, 'utf8') > PASSWORD_MAX_BYTES) return `Use at most ${PASSWORD_MAX_BYTES} bytes (about 72 plain letters)`;
  if (COMMON.has(password.toLowerCase())) return 'This password is among the most common ones; choose another';
  return null;
}
