import type { NextFunction, Request, Response } from 'express';

import { HttpError } from '../errors';

export function notFoundHandler(req: Request, _res: Response, next: NextFunction) {
  next(new HttpError(404, 'not_found', `No API route for ${req.method} ${req.path}.`));
}

export function errorHandler(err: unknown, _req: Request, res: Response, _next: NextFunction) {
  if (err instanceof HttpError) {
    res
      .status(err.status)
      .json({ error: { code: err.code, message: err.message, ...(err.fields && { fields: err.fields }) }, ...err.extra });
    return;
  }
  const status = (err as { status?: number; type?: string }).status;
  if (status === 400 || (err as { type?: string }).type === 'entity.parse.failed') {
    res.status(400).json({ error: { code: 'bad_request', message: 'The request body could not be read as JSON.' } });
    return;
  }
  if (status === 413) {
    res.status(413).json({ error: { code: 'too_large', message: 'The request is too large.' } });
    return;
  }
  console.error(err);
  res.status(500).json({ error: { code: 'server_error', message: 'Something went wrong on our side. Please try again.' } });
}
