import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { findUserWithMemberships } from './require-auth';
import { verifyPassword } from './passwords';
import './types';

/** A passport of our own (not the module singleton) so each app instance is independent. */
export function createPassport() {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      findUserWithMemberships({ email })
        .then(async (user) => ((await verifyPassword(password, user?.passwordHash)) ? done(null, user!) : done(null, false)))
        .catch(done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    findUserWithMemberships({ id })
      .then((user) => done(null, user ?? false))
      .catch(done);
  });
  return passport;
}
