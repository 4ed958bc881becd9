/** A passport instance per app: local strategy over our users, the session holding only the user id. */
import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AppContext } from '../context.ts';
import { findAuthUser, verifyCredentials } from '../services/user-service.ts';
import type { AuthUser } from './types.ts';
import { cachedUser } from './user-cache.ts';

export type Authenticator = InstanceType<typeof Passport>;

export function createPassport(ctx: AppContext): Authenticator {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', session: true }, (email, password, done) => {
      verifyCredentials(ctx, email, password).then(
        (user) => done(null, user ?? false),
        (err: unknown) => done(err),
      );
    }),
  );
  passport.serializeUser((user, done) => done(null, (user as AuthUser).id));
  passport.deserializeUser((id: string, done) => {
    // A removed member's session simply stops being signed in.
    cachedUser(ctx, id, () => findAuthUser(ctx, id)).then(
      (user) => done(null, user ?? false),
      (err: unknown) => done(err),
    );
  });
  return passport;
}
