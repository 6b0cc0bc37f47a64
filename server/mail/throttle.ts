import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';

/**
 * Rate limits of the e-mail features (OWASP ASVS 5.0 §2.4.1 anti-automation; OWASP Forgot
 * Password Cheat Sheet, "rate limiting"), counted in MariaDB with its clock so that every app
 * server sees the same counts:
 * - password-reset requests per address: beyond the limit no further message goes out, but the
 *   answer stays the same, so the limit tells nothing about whether the address has an account;
 * - password-reset requests per client address (IP): beyond it, 429;
 * - invitations sent (new and resent) per studio: beyond it, 429.
 */
export const MAIL_LIMITS = {
  resetPerAddress: { max: 3, minutes: 60 },
  resetPerIp: { max: 20, minutes: 60 },
  invitationsPerStudio: { max: 20, minutes: 60 },
} as const;

export type MailBucket = keyof typeof MAIL_LIMITS;

function keyHash(key: string): string {
  return createHash('sha256').update(key.trim().toLowerCase()).digest('hex');
}

/**
 * Counts one attempt in `bucket` for `key` and says whether it is within the limit. Attempts
 * over the limit are not counted, so the window always ends `minutes` after the last allowed one.
 * Two app servers answering at the same instant may let one extra attempt through; the limits
 * are there against floods, where one more message does not matter.
 */
export async function mailThrottleHit(sequelize: Sequelize, bucket: MailBucket, key: string): Promise<boolean> {
  const { max, minutes } = MAIL_LIMITS[bucket];
  const hash = keyHash(key);
  const rows = await sequelize.query<{ n: number | string }>(
    `SELECT COUNT(*) AS n FROM mail_throttle
      WHERE bucket = :bucket AND key_hash = :hash AND created_at > UTC_TIMESTAMP(3) - INTERVAL ${minutes} MINUTE`,
    { type: QueryTypes.SELECT, replacements: { bucket, hash } },
  );
  if (Number(rows[0]?.n ?? 0) >= max) return false;
  await sequelize.query('INSERT INTO mail_throttle (bucket, key_hash, created_at) VALUES (?, ?, UTC_TIMESTAMP(3))', {
    replacements: [bucket, hash],
  });
  const longest = Math.max(...Object.values(MAIL_LIMITS).map((l) => l.minutes));
  await sequelize.query(`DELETE FROM mail_throttle WHERE created_at < UTC_TIMESTAMP(3) - INTERVAL ${longest} MINUTE LIMIT 500`);
  return true;
}
