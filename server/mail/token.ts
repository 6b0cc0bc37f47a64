import { createHash, randomBytes } from 'node:crypto';

/** SHA-256 of a token, hex: the only form in which e-mailed tokens are stored. */
export function tokenHash(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/**
 * A new link token: 32 bytes from the CSPRNG in base64url (43 characters, 256 bits; OWASP ASVS
 * 5.0 §7.2.3 asks for at least 128 bits of entropy in reference tokens) and its hash.
 */
export function tokenCreate(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: tokenHash(token) };
}
