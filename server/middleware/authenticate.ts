import type { RequestHandler } from 'express';
import type { Authenticator } from '../auth/passport.js';

/**
 * Absolute session timeout (OWASP ASVS 5.0 §7.3.2; OWASP Session Management Cheat Sheet,
 * "Absolute Timeout"): a signed-in session older than `absoluteMs` is thrown away and a fresh,
 * anonymous one takes its place, whatever its recent activity.
 */
export function absoluteTimeout(absoluteMs: number): RequestHandler {
  return (req, _res, next) => {
    const s = req.session as (typeof req.session & { passport?: { user?: unknown } }) | undefined;
    if (!s?.passport?.user) return next();
    const signedInAt = s.signedInAt;
    if (typeof signedInAt === 'number' && Date.now() - signedInAt <= absoluteMs) return next();
    s.regenerate((err) => next(err));
  };
}

/** passport on every API request: the session's member id becomes `req.user`, read fresh. */
export function authenticate(auth: Authenticator, absoluteMs: number): RequestHandler[] {
  return [auth.initialize(), absoluteTimeout(absoluteMs), auth.session()];
}
