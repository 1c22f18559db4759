import type { NextFunction, Request, Response } from 'express';

import { HttpError } from '../errors';

// No Sightline body nests deeper than a few levels; MariaDB refuses JSON past depth 32, so a
// deeply nested body is refused here, clearly, before it can reach a JSON column.
export const MAX_JSON_DEPTH = 12;

function depthOf(value: unknown, limit: number): number {
  if (value === null || typeof value !== 'object') return 0;
  if (limit <= 0) return 1;
  let deepest = 0;
  for (const child of Object.values(value as Record<string, unknown>)) {
    deepest = Math.max(deepest, depthOf(child, limit - 1));
    if (deepest >= limit) break;
  }
  return deepest + 1;
}

export function limitJsonDepth(req: Request, _res: Response, next: NextFunction) {
  if (req.body && typeof req.body === 'object' && depthOf(req.body, MAX_JSON_DEPTH + 1) > MAX_JSON_DEPTH) {
    next(new HttpError(400, 'too_deep', `The request body nests deeper than ${MAX_JSON_DEPTH} levels.`));
    return;
  }
  next();
}
