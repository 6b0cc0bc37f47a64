import type { RequestHandler } from 'express';
import { Forbidden, Unauthorized } from '../lib/errors.js';
import type { Role } from '../models/user.js';
import type { SessionUser } from '../services/context.js';

/** 401 unless a member is signed in (the user is re-read from the database on every request). */
export const requireAuth: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(new Unauthorized());
  next();
};

/** 401 when signed out, 403 when the member's role is not among `roles`. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    const user = req.user as SessionUser | undefined;
    if (!user) return next(new Unauthorized());
    if (!roles.includes(user.role)) return next(new Forbidden());
    next();
  };
}
