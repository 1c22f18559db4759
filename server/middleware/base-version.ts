import type { NextFunction, Request, Response } from 'express';

import { HttpError } from '../errors';

// A save of a draft names the version it was based on in If-Match ("3" or 3). Without it the
// server could only overwrite, so the request is refused (428) before anything is read.
export function requireBaseVersion(req: Request, _res: Response, next: NextFunction) {
  const raw = req.get('If-Match');
  const match = raw === undefined ? null : /^\s*(?:W\/)?"?(\d{1,9})"?\s*$/.exec(raw);
  if (!match) {
    next(
      new HttpError(428, 'base_version_required', 'Send the version of the draft this save is based on in the If-Match header.', {
        'If-Match': raw === undefined ? 'Missing' : 'A version number such as "3"',
      }),
    );
    return;
  }
  req.baseVersion = Number(match[1]);
  next();
}
