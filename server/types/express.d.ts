import type {} from 'passport';
import type { SessionUser } from '../services/context.js';

declare global {
  namespace Express {
    // passport's req.user is the member loaded fresh from the database on every request.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

export {};
