import session, { type CookieOptions } from 'express-session';
import type { RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { KnitwrightSessionStore } from '../auth/session-store.js';
import type { AppConfig } from '../config.js';

declare module 'express-session' {
  interface SessionData {
    /** When the member signed in (ms since epoch): the absolute timeout counts from here. */
    signedInAt?: number;
    passport?: { user?: number };
  }
}

export interface SessionSetup {
  middleware: RequestHandler;
  store: KnitwrightSessionStore;
  cookieName: string;
  cookieOptions: CookieOptions;
  idleMs: number;
  absoluteMs: number;
}

const HOUR_MS = 60 * 60 * 1000;

/** The cookie's name and attributes for this configuration (sign-out clears it with the same). */
export function sessionCookie(config: AppConfig): { cookieName: string; cookieOptions: CookieOptions; idleMs: number } {
  const secure = config.SECURE_COOKIES ?? config.NODE_ENV === 'production';
  const idleMs = config.SESSION_IDLE_HOURS * HOUR_MS;
  return {
    cookieName: secure ? '__Host-knitwright.sid' : 'knitwright.sid',
    cookieOptions: { httpOnly: true, sameSite: 'lax', secure, path: '/', maxAge: idleMs },
    idleMs,
  };
}

/**
 * The session cookie (OWASP ASVS 5.0 §3.3.1, §3.3.2, §3.3.4; OWASP Session Management Cheat
 * Sheet, "Cookies"): HttpOnly, SameSite=Lax, Path=/; Secure with the `__Host-` prefix when
 * SECURE_COOKIES is on (the default in production). Rolling idle timeout: each answer moves the
 * expiry on by SESSION_IDLE_HOURS; the absolute timeout is enforced by `authenticate`.
 */
export function sessionSetup(config: AppConfig, sequelize: Sequelize): SessionSetup {
  const { cookieName, cookieOptions, idleMs } = sessionCookie(config);
  const absoluteMs = config.SESSION_ABSOLUTE_DAYS * 24 * HOUR_MS;
  const store = new KnitwrightSessionStore(sequelize, idleMs);
  const middleware = session({
    name: cookieName,
    secret: config.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    unset: 'destroy',
    cookie: cookieOptions,
  });
  return { middleware, store, cookieName, cookieOptions, idleMs, absoluteMs };
}
