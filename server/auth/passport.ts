import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';

import { findActiveSessionUser, verifyCredentials } from '../services/users-service';

// One message for every failure, so the answer never tells whether an e-mail is registered.
export const SIGN_IN_FAILED = 'That e-mail and password do not match an active account.';

passport.use(
  new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
    verifyCredentials(email, password)
      .then((user) => done(null, user ?? false, user ? undefined : { message: SIGN_IN_FAILED }))
      .catch(done);
  }),
);

passport.serializeUser((user, done) => done(null, user.id));

// Re-read on every request so a role change or deactivation takes effect at once.
passport.deserializeUser((id: number, done) => {
  findActiveSessionUser(id)
    .then((user) => done(null, user ?? false))
    .catch(done);
});

export { passport };
