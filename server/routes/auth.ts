import { Router, type Request } from 'express';
import { ProfileUpdateSchema, SignInSchema, SignUpSchema, type ProfileUpdateInput, type SignUpInput } from '../../shared/schemas/auth.js';
import type { AppDeps } from '../app.js';
import { passportFor } from '../auth/passport.js';
import { AppError } from '../lib/errors.js';
import { requireAuth } from '../middleware/require-role.js';
import { sessionCookie } from '../middleware/session.js';
import { validate } from '../middleware/validate.js';
import * as accounts from '../services/accounts.js';
import { ctx, type SessionUser } from '../services/context.js';

/** passport's logIn regenerates the session id (ASVS 5.0 §7.2.4), then the sign-in time is kept. */
function logIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) =>
    req.logIn(user, (err) => {
      if (err) return reject(err as Error);
      req.session.signedInAt = Date.now();
      resolve();
    }),
  );
}

function userCtx(user: SessionUser) {
  return { userId: user.id, studioId: user.studioId, role: user.role, unit: user.unit };
}

/**
 * `/api/auth`: sign-up (a studio and its owner), sign-in, sign-out and the member's own profile.
 * Every answer that names the member is a `MeResponse`.
 */
export function authRouter(deps: AppDeps): Router {
  const router = Router();
  const auth = passportFor(deps);
  const { cookieName, cookieOptions } = sessionCookie(deps.config);

  router.post('/signup', validate(SignUpSchema), async (req, res) => {
    const { user, me } = await accounts.signUp(deps.sequelize, req.body as SignUpInput);
    await logIn(req, user);
    res.status(201).json(me);
  });

  router.post('/signin', validate(SignInSchema), (req, res, next) => {
    const done = (err: unknown, user: SessionUser | false) => {
      if (err) return next(err);
      if (!user) return next(new AppError(401, 'invalid_credentials', accounts.SIGN_IN_FAILED_MESSAGE));
      logIn(req, user)
        .then(() => accounts.meGet(userCtx(user)))
        .then((me) => res.json(me))
        .catch(next);
    };
    auth.authenticate('local', done)(req, res, next);
  });

  // Signing out destroys the session row, so the old cookie is refused by every app server.
  router.post('/signout', (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        const { httpOnly, secure, sameSite, path } = cookieOptions;
        res.clearCookie(cookieName, { httpOnly, secure: secure === true, sameSite, path });
        res.status(204).end();
      });
    });
  });

  router.get('/me', requireAuth, async (req, res) => {
    res.json(await accounts.meGet(ctx(req)));
  });

  router.patch('/me', requireAuth, validate(ProfileUpdateSchema), async (req, res) => {
    const body = req.body as ProfileUpdateInput;
    res.json(await accounts.profileUpdate(deps.sequelize, ctx(req), body, { ip: req.ip ?? 'unknown', keepSid: req.sessionID }));
  });

  return router;
}
