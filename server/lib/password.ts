import argon2 from 'argon2';

/**
 * argon2id with m = 19 MiB, t = 2, p = 1: the minimum configuration recommended by the
 * OWASP Password Storage Cheat Sheet.
 */
export const PASSWORD_HASH_OPTIONS = {
  type: argon2.argon2id,
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
} as const;

export function passwordHash(password: string): Promise<string> {
  return argon2.hash(password, PASSWORD_HASH_OPTIONS);
}

export async function passwordVerify(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}
