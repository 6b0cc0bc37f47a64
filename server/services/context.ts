import type { Request } from 'express';
import type { Transaction } from 'sequelize';
import { Unauthorized } from '../lib/errors.js';
import type { Role } from '../models/user.js';

/** Who is asking, for which studio: every service call is scoped by this. */
export interface ServiceContext {
  userId: number;
  studioId: number;
  role: Role;
  /** The studio's display unit, for messages that quote lengths. */
  unit: 'in' | 'cm';
  transaction?: Transaction;
}

/** The signed-in member as loaded fresh on every request by the authentication middleware. */
export interface SessionUser {
  id: number;
  studioId: number;
  role: Role;
  email: string;
  name: string;
  unit: 'in' | 'cm';
}

/** Builds the service context from an authenticated request. */
export function ctx(req: Request): ServiceContext {
  const user = req.user as SessionUser | undefined;
  if (!user) throw new Unauthorized();
  return { userId: user.id, studioId: user.studioId, role: user.role, unit: user.unit };
}
