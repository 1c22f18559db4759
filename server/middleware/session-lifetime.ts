import type { NextFunction, Request, Response } from 'express';

import { config } from '../config';

declare module 'express-session' {
  interface SessionData {
    signedInAt?: number;
  }
}

// Besides the idle timeout (the cookie's rolling maxAge), a session ends a fixed time after
// sign-in however busy it is (OWASP ASVS 4.0, V3.3): the person signs in again.
export function endStaleSessions(req: Request, _res: Response, next: NextFunction) {
  const signedInAt = req.session?.signedInAt;
  if (!req.user || signedInAt === undefined || Date.now() - signedInAt <= config.sessionAbsoluteHours * 3_600_000) return next();
  req.logout(() => req.session.destroy(() => next()));
}
