import { Router } from 'express';
import { body } from 'express-validator';

import { passport, SIGN_IN_FAILED } from '../auth/passport';
import { HttpError } from '../errors';
import { requireAuth } from '../middleware/require-auth';
import { signInLimitPerIp, signInSlowDownPerAccount } from '../middleware/sign-in-limits';
import { validate } from '../middleware/validate';

export const sessionRouter = Router();

// POST /api/session: sign in. passport 0.7 regenerates the session id inside req.login.
sessionRouter.post(
  '/',
  signInLimitPerIp,
  signInSlowDownPerAccount,
  validate(
    body('email', 'Enter a valid e-mail address').isString().isLength({ max: 254 }).trim().isEmail(),
    body('password', 'Enter your password').isString().isLength({ min: 1, max: 200 }),
  ),
  (req, res, next) => {
    passport.authenticate('local', (err: unknown, user: Express.User | false) => {
      if (err) return next(err);
      if (!user) return next(new HttpError(401, 'sign_in_failed', SIGN_IN_FAILED));
      req.login(user, (loginErr) => {
        if (loginErr) return next(loginErr);
        req.session.signedInAt = Date.now();
        res.status(200).json({ user });
      });
    })(req, res, next);
  },
);

// DELETE /api/session: sign out and remove the session row.
sessionRouter.delete('/', requireAuth, (req, res, next) => {
  req.logout((err) => {
    if (err) return next(err);
    req.session.destroy((destroyErr) => {
      if (destroyErr) return next(destroyErr);
      res.clearCookie('sightline.sid');
      res.status(204).end();
    });
  });
});
