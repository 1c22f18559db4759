import { Router } from 'express';
import { body } from 'express-validator';

import { passwordResetLimitPerIp } from '../middleware/sign-in-limits';
import { validate } from '../middleware/validate';
import { requestPasswordReset, setPasswordWithToken } from '../services/account-service';

// Public: "forgot password" and setting a password from an invitation or reset link.
export const passwordRouter = Router();

passwordRouter.post(
  '/forgot',
  passwordResetLimitPerIp,
  validate(body('email', 'Enter a valid e-mail address').isString().isLength({ max: 254 }).trim().isEmail()),
  async (req, res) => {
    await requestPasswordReset(req.body.email);
    // The same words whether or not the address has an account.
    res.status(202).json({ message: 'If an account uses this address, a link to set a new password is on its way.' });
  },
);

passwordRouter.post(
  '/reset',
  passwordResetLimitPerIp,
  validate(
    body('token', 'The link is incomplete').isString().isLength({ min: 20, max: 100 }),
    body('password', 'Enter a new password').isString().isLength({ min: 1, max: 300 }),
  ),
  async (req, res) => {
    res.json(await setPasswordWithToken(req.body.token, req.body.password));
  },
);
