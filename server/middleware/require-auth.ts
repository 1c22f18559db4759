import type { NextFunction, Request, Response } from 'express';

import type { Role } from '../../shared/roles';
import { HttpError } from '../errors';

export function requireAuth(req: Request, _res: Response, next: NextFunction) {
  if (!req.user) return next(new HttpError(401, 'not_signed_in', 'Please sign in.'));
  next();
}

// Roles are also hidden in the client, but this check is the one that counts.
export function requireRole(...roles: Role[]) {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (!req.user) return next(new HttpError(401, 'not_signed_in', 'Please sign in.'));
    if (!roles.includes(req.user.role)) {
      return next(new HttpError(403, 'forbidden', `This needs the ${roles.join(' or ')} role.`));
    }
    next();
  };
}
