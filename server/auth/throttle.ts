import { createHash } from 'node:crypto';
import net from 'node:net';
import { QueryTypes, type Sequelize } from 'sequelize';

/**
 * Sign-in throttling (OWASP ASVS 5.0 §6.3.1; OWASP Authentication Cheat Sheet, "Protect against
 * automated attacks"): after SIGN_IN_MAX_FAILURES failures within SIGN_IN_WINDOW_MINUTES, for
 * one account or from one address, further attempts are refused until the oldest failures leave
 * the window. Refused attempts are not counted, so nobody can keep a member locked out longer
 * than the window by hammering the account. The counts live in MariaDB so every app server
 * sees the same ones; times come from the database clock for the same reason.
 */
export const SIGN_IN_MAX_FAILURES = 10;
export const SIGN_IN_WINDOW_MINUTES = 15;

/** SHA-256 of the normalised e-mail: the failure log never stores what people typed. */
export function accountKey(email: string): string {
  return createHash('sha256').update(email.trim().toLowerCase()).digest('hex');
}

/**
 * The address a failure is counted against. IPv4-mapped IPv6 becomes plain IPv4; an IPv6
 * address counts as its /64 network, since one subscriber usually holds a whole /64 and could
 * otherwise step through fresh addresses (the same idea as express-rate-limit's IPv6 subnets).
 */
export function addressKey(ip: string): string {
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(ip);
  if (mapped) return mapped[1]!;
  if (!net.isIPv6(ip)) return ip;
  const [head = '', tail = ''] = ip.toLowerCase().split('::');
  const left = head ? head.split(':') : [];
  const right = ip.includes('::') ? (tail ? tail.split(':') : []) : [];
  const groups = ip.includes('::') ? [...left, ...Array<string>(8 - left.length - right.length).fill('0'), ...right] : left;
  return `${groups.slice(0, 4).map((g) => Number.parseInt(g, 16).toString(16)).join(':')}::/64`;
}

export interface ThrottleState {
  accountFailures: number;
  ipFailures: number;
}

/** Failures within the window for this account and for this address. */
export async function signInFailuresCount(sequelize: Sequelize, email: string, ip: string): Promise<ThrottleState> {
  const key = accountKey(email);
  const address = addressKey(ip);
  const rows = await sequelize.query<{ account: string | number | null; address: string | number | null }>(
    `SELECT SUM(account_key = :key) AS account, SUM(ip = :ip) AS address
       FROM sign_in_failures
      WHERE (account_key = :key OR ip = :ip)
        AND created_at > UTC_TIMESTAMP(3) - INTERVAL ${SIGN_IN_WINDOW_MINUTES} MINUTE`,
    { type: QueryTypes.SELECT, replacements: { key, ip: address } },
  );
  const row = rows[0];
  return { accountFailures: Number(row?.account ?? 0), ipFailures: Number(row?.address ?? 0) };
}

/** True when this attempt must be refused before the password is even looked at. */
export async function signInBlocked(sequelize: Sequelize, email: string, ip: string): Promise<boolean> {
  const { accountFailures, ipFailures } = await signInFailuresCount(sequelize, email, ip);
  return accountFailures >= SIGN_IN_MAX_FAILURES || ipFailures >= SIGN_IN_MAX_FAILURES;
}

/** Records one failure and drops rows that have left the window. */
export async function signInFailureRecord(sequelize: Sequelize, email: string, ip: string): Promise<void> {
  await sequelize.query('INSERT INTO sign_in_failures (account_key, ip, created_at) VALUES (?, ?, UTC_TIMESTAMP(3))', {
    replacements: [accountKey(email), addressKey(ip)],
  });
  await sequelize.query(
    `DELETE FROM sign_in_failures WHERE created_at < UTC_TIMESTAMP(3) - INTERVAL ${SIGN_IN_WINDOW_MINUTES} MINUTE LIMIT 500`,
  );
}

/**
 * A successful sign-in forgets that account's failures (from every address). Failures the same
 * address made against other accounts stay counted, so signing in to one's own account does not
 * reset a password-spraying run.
 */
export async function signInFailuresClear(sequelize: Sequelize, email: string): Promise<void> {
  await sequelize.query('DELETE FROM sign_in_failures WHERE account_key = ?', { replacements: [accountKey(email)] });
}
