import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AppDeps } from '../app.js';
import { credentialsCheck, sessionUserLoad, signInPrepare } from '../services/accounts.js';
import type { SessionUser } from '../services/context.js';

export type Authenticator = InstanceType<typeof passport.Authenticator>;

const instances = new WeakMap<AppDeps, Authenticator>();

/**
 * One passport per app (never the module-wide singleton, so apps built side by side in one
 * process do not share strategies). Only the member's id goes into the session; the member,
 * role, disabled flag and studio unit are read from the database on every request, so a role
 * change or a disabled account takes effect on the next request (ASVS 5.0 §7.4.2).
 */
export function passportFor(deps: AppDeps): Authenticator {
  const existing = instances.get(deps);
  if (existing) return existing;
  const auth = new passport.Authenticator();
  auth.use(
    'local',
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', passReqToCallback: true, session: true }, (req, email, password, done) => {
      credentialsCheck(deps.sequelize, email, password, req.ip ?? 'unknown').then(
        (user) => done(null, user),
        (err: unknown) => done(err),
      );
    }),
  );
  auth.serializeUser<number>((user, done) => done(null, (user as SessionUser).id));
  auth.deserializeUser<unknown>((id, done) => {
    sessionUserLoad(id).then(
      (user) => done(null, user ?? false),
      (err: unknown) => done(err),
    );
  });
  void signInPrepare();
  instances.set(deps, auth);
  return auth;
}
