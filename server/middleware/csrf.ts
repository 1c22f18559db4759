import type { NextFunction, Request, Response } from 'express';

import { HttpError } from '../errors';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
export const CSRF_HEADER = 'x-sightline-request';

// CSRF defence by strict same-origin checks instead of a token package: the API is only
// ever called by our own client through fetch, so every state-changing request must carry
// a custom header (a cross-site form cannot set one, and we send no CORS headers that would
// let another origin's script set it), and a browser-sent Origin must be our own host.
// Together with SameSite=Lax cookies this needs no per-session token state, which keeps
// instances stateless.
export function requireSameOrigin(req: Request, _res: Response, next: NextFunction) {
  if (SAFE_METHODS.has(req.method)) return next();
  if (req.get(CSRF_HEADER) !== '1') {
    return next(new HttpError(403, 'csrf_rejected', `State-changing requests must send the ${CSRF_HEADER} header.`));
  }
  const origin = req.get('origin');
  if (origin !== undefined && !sameOrigin(origin, req)) {
    return next(new HttpError(403, 'csrf_rejected', 'Requests from another site are refused.'));
  }
  next();
}

// Scheme and host must both match ours; "null" (a sandboxed or file page) and anything that
// does not parse as a URL are another site.
function sameOrigin(origin: string, req: Request): boolean {
  let parsed: URL;
  try {
    parsed = new URL(origin);
  } catch {
    return false;
  }
  return parsed.host === req.get('host') && parsed.protocol === `${req.protocol}:`;
}
