import { Router } from 'express';
import { body, param } from 'express-validator';

import { ROLES } from '../../shared/roles';
import { requireRole } from '../middleware/require-auth';
import { validate } from '../middleware/validate';
import { inviteUser } from '../services/account-service';
import { listUsers, updateUser } from '../services/users-service';

export const usersRouter = Router();
usersRouter.use(requireRole('admin'));

usersRouter.get('/', async (_req, res) => {
  res.json({ users: await listUsers() });
});

usersRouter.post(
  '/',
  validate(
    body('name', 'Enter a name of 2 to 120 characters').isString().trim().isLength({ min: 2, max: 120 }),
    body('email', 'Enter a valid e-mail address').isString().trim().isEmail().isLength({ max: 254 }),
    body('role', `Choose one of: ${ROLES.join(', ')}`).isIn(ROLES),
  ),
  // No password is typed by the admin: the new person chooses it from the invitation e-mail.
  async (req, res) => {
    const user = await inviteUser({ name: req.body.name, email: req.body.email, role: req.body.role });
    res.status(201).json({ user });
  },
);

usersRouter.patch(
  '/:id',
  validate(
    param('id', 'Must be a user id').isInt({ min: 1 }).toInt(),
    body('role', `Choose one of: ${ROLES.join(', ')}`)
      .optional()
      .isIn(ROLES),
    body('active', 'Must be true or false').optional().isBoolean({ strict: true }),
    body()
      .custom((value) => value && (value.role !== undefined || value.active !== undefined))
      .withMessage('Send a role or an active flag'),
  ),
  async (req, res) => {
    const { role, active } = req.body;
    const user = await updateUser(req.user!.id, Number(req.params.id), { role, active });
    res.json({ user });
  },
);
