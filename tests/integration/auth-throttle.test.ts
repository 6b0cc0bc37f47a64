/**
 * Sign-in throttling per account and per address (OWASP ASVS 5.0 §6.3.1, number from memory;
 * OWASP Authentication Cheat Sheet, "Protect Against Automated Attacks" and "Account Lockout").
 * Each test uses its own client addresses (X-Forwarded-For from the loopback proxy) so the
 * per-address counts of one test never reach another.
 */
import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { afterAll, describe, expect, it } from 'vitest';
import { accountKey, addressKey, SIGN_IN_MAX_FAILURES, SIGN_IN_WINDOW_MINUTES } from '../../server/auth/throttle.js';
import { csrfHeaders, studioSignUp, TEST_PASSWORD, testIp, uniqueEmail } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';

const { app, sequelize, close } = testAppCreate();
afterAll(close);

function signInFrom(ip: string, email: string, password: string) {
  return request(app).post('/api/auth/signin').set(csrfHeaders).set('X-Forwarded-For', ip).send({ email, password });
}

async function failuresOf(email: string): Promise<number> {
  const rows = await sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM sign_in_failures WHERE account_key = ?', {
    type: QueryTypes.SELECT,
    replacements: [accountKey(email)],
  });
  return Number(rows[0]?.n ?? 0);
}

/** Moves an account's failures back in time, as if the window had passed. */
async function failuresAge(email: string, minutes: number): Promise<void> {
  await sequelize.query(`UPDATE sign_in_failures SET created_at = created_at - INTERVAL ${minutes} MINUTE WHERE account_key = ?`, {
    replacements: [accountKey(email)],
  });
}

describe('sign-in throttling', () => {
  it(`locks an account after ${SIGN_IN_MAX_FAILURES} failures from many addresses, even for the right password, for the window only`, async () => {
    const { email } = await studioSignUp(app);
    for (let i = 0; i < SIGN_IN_MAX_FAILURES; i += 1) {
      expect((await signInFrom(testIp(), email, `wrong-password-${i}`)).status).toBe(401);
    }
    const locked = await signInFrom(testIp(), email, TEST_PASSWORD);
    expect(locked.status).toBe(429);
    expect(locked.body).toEqual({ error: { code: 'too_many_requests', message: expect.any(String) } });

    // Refused attempts are not counted: hammering a locked account does not extend the lock.
    await signInFrom(testIp(), email, 'wrong-again');
    expect(await failuresOf(email)).toBe(SIGN_IN_MAX_FAILURES);

    await failuresAge(email, SIGN_IN_WINDOW_MINUTES + 1);
    expect((await signInFrom(testIp(), email, TEST_PASSWORD)).status).toBe(200);
  });

  it(`refuses an address after ${SIGN_IN_MAX_FAILURES} failures on any accounts, while the account still works elsewhere`, async () => {
    const { email } = await studioSignUp(app);
    const ip = testIp();
    for (let i = 0; i < SIGN_IN_MAX_FAILURES; i += 1) {
      expect((await signInFrom(ip, uniqueEmail('spray'), 'Autumn-2024')).status).toBe(401);
    }
    expect((await signInFrom(ip, email, TEST_PASSWORD)).status).toBe(429);
    expect((await signInFrom(testIp(), email, TEST_PASSWORD)).status).toBe(200);
  });

  it('forgets an account’s failures after a successful sign-in', async () => {
    const { email } = await studioSignUp(app);
    for (let i = 0; i < 3; i += 1) await signInFrom(testIp(), email, `typo-${i}`);
    expect(await failuresOf(email)).toBe(3);
    expect((await signInFrom(testIp(), email, TEST_PASSWORD)).status).toBe(200);
    expect(await failuresOf(email)).toBe(0);
  });

  it('stores a hash of the e-mail, never the address typed', async () => {
    const email = uniqueEmail('typed');
    await signInFrom(testIp(), email, 'whatever-it-was');
    const rows = await sequelize.query<{ account_key: string }>('SELECT account_key FROM sign_in_failures WHERE account_key = ?', {
      type: QueryTypes.SELECT,
      replacements: [accountKey(email)],
    });
    expect(rows).toHaveLength(1);
    expect(rows[0]!.account_key).toMatch(/^[0-9a-f]{64}$/);
  });

  it('counts an IPv6 client by its /64 network and an IPv4-mapped address as IPv4', () => {
    expect(addressKey('2001:db8:85a3:12:8a2e:370:7334:1')).toBe('2001:db8:85a3:12::/64');
    expect(addressKey('2001:db8:85a3:12::9')).toBe('2001:db8:85a3:12::/64');
    expect(addressKey('2001:DB8::1')).toBe('2001:db8:0:0::/64');
    expect(addressKey('::ffff:192.0.2.7')).toBe('192.0.2.7');
    expect(addressKey('192.0.2.7')).toBe('192.0.2.7');
  });

  it('locks a whole IPv6 /64 after failures from addresses inside it', async () => {
    const { email } = await studioSignUp(app);
    const net64 = `2001:db8:${(process.pid % 65536).toString(16)}:${(Date.now() % 65536).toString(16)}`;
    for (let i = 0; i < SIGN_IN_MAX_FAILURES; i += 1) {
      expect((await signInFrom(`${net64}::${(i + 1).toString(16)}`, uniqueEmail('v6'), 'Autumn-2024')).status).toBe(401);
    }
    expect((await signInFrom(`${net64}:ffff:ffff:ffff:ffff`, email, TEST_PASSWORD)).status).toBe(429);
  });
});
